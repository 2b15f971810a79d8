export const authKeys = {
  me: ['auth', 'me'] as const,
  devMail: ['auth', 'dev-mail'] as const,
};
