import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  CertificateCreated,
  CreatedId,
  type CertificateCreateInput,
  type ReasonInput,
  type SignOffInput,
} from '@shared/schemas/record';
import { api } from '@/lib/api-client';
import { recordKeys } from './record-keys';

/** Each action refreshes every record query: statuses, sign-offs and certificates move together. */
function useRecordMutation<I, O>(run: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: () => client.invalidateQueries({ queryKey: recordKeys.all }),
  });
}

export const useSignOff = (apprenticeId: number) =>
  useRecordMutation((body: SignOffInput) =>
    api(`/apprentices/${apprenticeId}/sign-offs`, { method: 'POST', body, schema: CreatedId }),
  );

export const useWithdrawSignOff = () =>
  useRecordMutation(({ id, ...body }: ReasonInput & { id: number }) =>
    api(`/sign-offs/${id}/withdraw`, { method: 'POST', body }),
  );

export const useIssueCertificate = () =>
  useRecordMutation((body: CertificateCreateInput) =>
    api('/certificates', { method: 'POST', body, schema: CertificateCreated }),
  );

export const useRevokeCertificate = () =>
  useRecordMutation(({ id, ...body }: ReasonInput & { id: number }) =>
    api(`/certificates/${id}/revoke`, { method: 'POST', body }),
  );
