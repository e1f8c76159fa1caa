/**
 * Catalog namespaces (locales/<language>/<namespace>.json) that only the server reads: mails, and the words the API
 * sends already translated (the seeded kinds of item, a group's privacy notice, the API's refusals in `problems`).
 * The browser's language chunks leave them out.
 */
export const SERVER_ONLY_NAMESPACES: readonly string[] = ['mail', 'categories', 'privacy', 'problems'];

/**
 * Namespaces the browser fetches only with a page that needs them (the router's `page(…, namespaces)`), so a visitor's
 * first load carries the public words and not the words of reception, the bench, organisers or admins. Every other
 * browser namespace comes with the language's first chunk.
 */
export const ON_DEMAND_NAMESPACES = ['account', 'desk', 'bench', 'organise', 'figures', 'admin'] as const;
export type OnDemandNamespace = (typeof ON_DEMAND_NAMESPACES)[number];
