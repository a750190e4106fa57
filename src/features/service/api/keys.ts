export const serviceKeys = {
  all: ['service'] as const,
  due: () => ['service', 'due'] as const,
};
