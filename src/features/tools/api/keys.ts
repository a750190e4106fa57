import type { ToolListQuery } from '@shared/schemas/tools';

export const toolKeys = {
  all: ['tools'] as const,
  list: (filters: Partial<ToolListQuery>) => ['tools', 'list', filters] as const,
  detail: (code: string) => ['tools', 'detail', code] as const,
  events: (code: string) => ['tools', 'events', code] as const,
  myLoans: () => ['tools', 'loans', 'mine'] as const,
  openLoans: () => ['tools', 'loans', 'open'] as const,
  loanStats: () => ['tools', 'loans', 'stats'] as const,
};
