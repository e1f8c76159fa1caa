/**
 * The languages Mendery speaks. A reader's language is one of these; anything else falls back to English.
 * Language tags are BCP 47 (RFC 5646): only the primary subtag decides here, so 'nl-BE' reads Dutch.
 */
export const LANGUAGES = ['en', 'nl', 'de', 'fr'] as const;
export type Language = (typeof LANGUAGES)[number];
export const DEFAULT_LANGUAGE: Language = 'en';

/** Each language's name in itself, as a language picker shows it. */
export const LANGUAGE_NAMES: Record<Language, string> = {
  en: 'English',
  nl: 'Nederlands',
  de: 'Deutsch',
  fr: 'Français',
};

export const isLanguage = (v: unknown): v is Language =>
  typeof v === 'string' && (LANGUAGES as readonly string[]).includes(v);

/** A stored language as one we speak (a row written before languages, or a language since dropped, reads `fallback`). */
export const asLanguage = (v: unknown, fallback: Language = DEFAULT_LANGUAGE): Language =>
  isLanguage(v) ? v : fallback;

/** The supported language of one BCP 47 tag ('de-AT' → 'de', 'pt-BR' → undefined). */
export function languageOfTag(tag: string | null | undefined): Language | undefined {
  const primary = tag?.trim().split(/[-_]/)[0]?.toLowerCase();
  return isLanguage(primary) ? primary : undefined;
}

/** The first supported language among tags in the reader's order of preference (e.g. navigator.languages). */
export function pickLanguage(
  tags: readonly (string | null | undefined)[],
  fallback: Language = DEFAULT_LANGUAGE,
): Language {
  for (const tag of tags) {
    const lang = languageOfTag(tag);
    if (lang) return lang;
  }
  return fallback;
}

/**
 * The tags of an HTTP Accept-Language header (RFC 9110 §12.5.4), best first: ordered by q-value, ties in written
 * order, q=0 ("not acceptable") left out. `fr-CH, fr;q=0.9, en;q=0.8, de;q=0.7, *;q=0.5` → fr-CH, fr, en, de, *.
 */
export function acceptLanguageTags(header: string | null | undefined): string[] {
  if (!header) return [];
  return header
    .split(',')
    .map((part, index) => {
      const [tag, ...params] = part.trim().split(';');
      const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
      const weight = q ? Number(q.slice(2)) : 1;
      return { tag: tag.trim(), weight: Number.isFinite(weight) ? weight : 0, index };
    })
    .filter((t) => t.tag && t.weight > 0)
    .sort((a, b) => b.weight - a.weight || a.index - b.index)
    .map((t) => t.tag);
}
