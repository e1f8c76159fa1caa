/** Every query key of the rota; `rotaKeys.all` is the prefix of them all. */
export const rotaKeys = {
  all: ['rota'] as const,
  myEvents: () => [...rotaKeys.all, 'my-events'] as const,
  event: (eventId: number) => [...rotaKeys.all, 'event', eventId] as const,
  calendarLink: () => [...rotaKeys.all, 'calendar-link'] as const,
};
