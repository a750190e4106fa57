export const overdueKeys = {
  all: ['overdue'] as const,
  list: () => ['overdue', 'list'] as const,
};
