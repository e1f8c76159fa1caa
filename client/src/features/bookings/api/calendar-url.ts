/** The booked slot as a calendar file; the browser downloads it, so this is a link, not a query. */
export const bookingCalendarUrl = (reference: string, token: string) =>
  `/api/bookings/${reference}/calendar?token=${encodeURIComponent(token)}`;
