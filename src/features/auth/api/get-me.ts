import { queryOptions, useQuery } from '@tanstack/react-query';
import { MeReply, type UserDTO } from '@shared/schemas/user';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from './auth-keys';

/** The signed-in user, or null when nobody is signed in (a 401 is an answer here, not an error). */
export async function getMe(): Promise<UserDTO | null> {
  try {
    return (await api('/auth/me', { schema: MeReply })).user;
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());

/** For pages that only render for a signed-in user (the shell guarantees it). */
export function useUser(): UserDTO {
  const { data } = useMe();
  if (!data) throw new Error('useUser outside a signed-in page');
  return data;
}
