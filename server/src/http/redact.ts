/** Query parameters that carry a secret: a booking's manage token and the like. */
const SECRET_PARAMS = /([?&](?:token|manageToken|secret)=)[^&#]*/gi;
/** Paths whose last segment is a secret link (waiting-list offers, re-booking, invitations, calendar feeds). */
const SECRET_PATHS = /(\/(?:waiting-list|rebook|invites|shift-calendars)\/)[^/?#]+/gi;

/** A request URL as it may be written to a log: every secret in it replaced by `[redacted]`. */
export const redactUrl = (url: string): string =>
  url.replace(SECRET_PARAMS, '$1[redacted]').replace(SECRET_PATHS, '$1[redacted]');
