export const mailKeys = {
  all: ['mail'] as const,
  list: () => ['mail', 'list'] as const,
  mine: () => ['mail', 'mine'] as const,
};
