import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApprenticeRecord, CertificateCheck, CertificateList } from '@shared/schemas/record';
import { api } from '@/lib/api-client';
import { recordKeys } from './record-keys';

export const recordQueryOptions = (apprenticeId: number) =>
  queryOptions({
    queryKey: recordKeys.detail(apprenticeId),
    queryFn: () => api(`/apprentices/${apprenticeId}/record`, { schema: ApprenticeRecord }),
  });

/** Skills by course with their evidence, sign-offs and hours: the apprentice's own, or one a mentor may read. */
export const useRecord = (apprenticeId: number) => useQuery(recordQueryOptions(apprenticeId));

export const useCertificates = (apprenticeId: number) =>
  useQuery({
    queryKey: recordKeys.certificates(apprenticeId),
    queryFn: () => api(`/certificates?apprenticeId=${apprenticeId}`, { schema: CertificateList }),
  });

/** The public check of a certificate's code; a 404 is an answer (no such certificate), so it is not retried. */
export const useCertificateCheck = (code: string) =>
  useQuery({
    queryKey: recordKeys.check(code),
    queryFn: () => api(`/verify/${encodeURIComponent(code)}`, { schema: CertificateCheck }),
    retry: false,
  });
