/** Every query key of the event day; `eventDayKeys.all` is the prefix of them all. */
export const eventDayKeys = {
  all: ['event-day'] as const,
  deskEvents: () => [...eventDayKeys.all, 'desk-events'] as const,
  desk: (eventId: number) => [...eventDayKeys.all, 'desk', eventId] as const,
  item: (id: number) => [...eventDayKeys.all, 'item', id] as const,
  hall: (eventId: number) => [...eventDayKeys.all, 'hall', eventId] as const,
  live: (eventId: number) => [...eventDayKeys.all, 'live', eventId] as const,
  tags: (eventId: number, q: { slotId?: number; items?: string }) => [...eventDayKeys.all, 'tags', eventId, q] as const,
  tag: (code: string) => [...eventDayKeys.all, 'tag', code] as const,
};

/**
 * The outcome's mutation key. A paused outcome is persisted on the phone under this key and resumed after a reload,
 * possibly by a newer build, so its value never changes.
 */
export const outcomeMutationKey = ['item-outcome'] as const;
