/** Every query key of the benches; `benchKeys.event(id)` is one session's layout. */
export const benchKeys = {
  all: ['benches'] as const,
  event: (eventId: number) => [...benchKeys.all, 'event', eventId] as const,
};
