/** Every query key of the workbench; `workbenchKeys.queue()` is the fixer's own queue. */
export const workbenchKeys = {
  all: ['workbench'] as const,
  queue: () => [...workbenchKeys.all, 'queue'] as const,
};
