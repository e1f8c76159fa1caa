/** Every query key of triage; `triageKeys.board(id)` is one session's board, `run(id, runId)` one stored run. */
export const triageKeys = {
  all: ['triage'] as const,
  board: (eventId: number) => [...triageKeys.all, 'board', eventId] as const,
  run: (eventId: number, runId: number) => [...triageKeys.all, 'run', eventId, runId] as const,
};
