/**
 * Catalog namespaces (locales/<language>/<namespace>.json) that only the server reads: mails, and the words the API
 * sends already translated (the seeded kinds of item, a group's privacy notice). The browser's language chunks leave
 * them out.
 */
export const SERVER_ONLY_NAMESPACES: readonly string[] = ['mail', 'categories', 'privacy'];
