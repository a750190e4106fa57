export const labelKeys = {
  all: ['labels'] as const,
  layouts: () => ['labels', 'layouts'] as const,
  tools: () => ['labels', 'tools'] as const,
  bins: () => ['labels', 'bins'] as const,
};
