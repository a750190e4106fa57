export const peopleKeys = {
  all: ['people'] as const,
  list: () => ['people', 'list'] as const,
  invitations: () => ['people', 'invitations'] as const,
};
