/** The person's shifts as a calendar file; the browser downloads it, so this is a link, not a query. */
export const shiftsCalendarUrl = () => '/api/me/shifts/calendar';
