export const privacyKeys = {
  all: ['privacy'] as const,
  notice: (groupId: number) => [...privacyKeys.all, 'notice', groupId] as const,
};
