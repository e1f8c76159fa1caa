/** Every query key of triage; `triageKeys.board(id)` is one session's board. */
export const triageKeys = {
  all: ['triage'] as const,
  board: (eventId: number) => [...triageKeys.all, 'board', eventId] as const,
};
