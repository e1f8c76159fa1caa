/** Every query key of the skills feature; `skillKeys.all` is the prefix of them all. */
export const skillKeys = {
  all: ['skills'] as const,
  profile: () => [...skillKeys.all, 'profile'] as const,
  matrices: () => [...skillKeys.all, 'matrix'] as const,
  matrix: (groupId: number) => [...skillKeys.matrices(), groupId] as const,
};
