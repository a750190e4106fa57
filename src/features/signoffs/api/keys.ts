export const signoffKeys = {
  all: ['signoffs'] as const,
  list: () => ['signoffs', 'list'] as const,
  mine: () => ['signoffs', 'mine'] as const,
  requests: () => ['signoffs', 'requests'] as const,
  myRequests: () => ['signoffs', 'requests', 'mine'] as const,
};

export const cribSettingsKeys = {
  all: ['crib-settings'] as const,
};
