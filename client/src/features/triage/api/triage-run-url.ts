/** The address of one run's inputs and result as JSON; the browser opens it, so this is a link, not a query. */
export const triageRunUrl = (eventId: number, runId: number) => `/api/events/${eventId}/triage-runs/${runId}`;
