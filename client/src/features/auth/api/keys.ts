export const authKeys = { config: ['public', 'config'] as const };
