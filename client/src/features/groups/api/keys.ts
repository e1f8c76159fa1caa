/** Every query key of the groups feature; invalidate by `groupKeys.all`. */
export const groupKeys = {
  all: ['groups'] as const,
  public: () => [...groupKeys.all, 'public'] as const,
  members: (groupId: number) => [...groupKeys.all, groupId, 'members'] as const,
  venues: (groupId: number) => [...groupKeys.all, groupId, 'venues'] as const,
  settings: (groupId: number) => [...groupKeys.all, groupId, 'settings'] as const,
  invitation: (token: string) => [...groupKeys.all, 'invitation', token] as const,
};
