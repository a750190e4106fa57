export const authKeys = {
  all: ['auth'] as const,
  me: () => ['auth', 'me'] as const,
  invitation: (token: string) => ['auth', 'invitation', token] as const,
};
