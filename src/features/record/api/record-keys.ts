/** Every record query lives under `all`, so a sign-off or a certificate refreshes the record and its certificates. */
export const recordKeys = {
  all: ['record'] as const,
  detail: (apprenticeId: number) => [...recordKeys.all, 'detail', apprenticeId] as const,
  certificates: (apprenticeId: number) => [...recordKeys.all, 'certificates', apprenticeId] as const,
  /** The public check is kept outside `all`: it is read by people who are not signed in. */
  check: (code: string) => ['certificate-check', code] as const,
};
