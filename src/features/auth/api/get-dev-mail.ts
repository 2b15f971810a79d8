import { queryOptions, useQuery } from '@tanstack/react-query';
import { DevMailReply } from '@shared/schemas/user';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';
import { useMe } from './get-me';

const devMailQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.devMail,
    queryFn: () => api('/dev-mail', { schema: DevMailReply }),
    staleTime: Infinity,
  });

/** The fake mail service's inbox page; only the admin may ask, so nobody else sends the request. */
export function useDevMail() {
  const { data: user } = useMe();
  return useQuery({ ...devMailQueryOptions(), enabled: user?.role === 'admin' });
}
