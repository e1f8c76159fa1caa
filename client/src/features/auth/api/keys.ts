/** Every query key of the auth feature. */
export const authKeys = {
  all: ['auth'] as const,
  config: () => [...authKeys.all, 'config'] as const,
  twoFactor: () => [...authKeys.all, 'two-factor'] as const,
};
