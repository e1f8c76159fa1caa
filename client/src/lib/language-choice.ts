import { languageOfTag, pickLanguage, type Language } from '../../../shared/i18n/languages';
import { PSEUDO_LANGUAGE } from '../../../shared/i18n/pseudo';

export type UiLanguage = Language | typeof PSEUDO_LANGUAGE;

/** Where the visitor's choice is kept on this device (and the name of the cookie that tells the server). */
export const STORAGE_KEY = 'mendery.language';

/**
 * ?lang= in the address, else the visitor's stored choice, else the browser's languages, else English. `guessed` is
 * true when nothing named a language we speak. Pure reading: both the early start (early-language.ts) and the app use it.
 */
export function pickInitialLanguage(stored: string | null): { lang: UiLanguage; guessed: boolean } {
  const asked = new URLSearchParams(location.search).get('lang');
  if (asked === PSEUDO_LANGUAGE) return { lang: PSEUDO_LANGUAGE, guessed: false };
  const tags = [asked, stored, ...(navigator.languages ?? [navigator.language])];
  return { lang: pickLanguage(tags), guessed: !tags.some(languageOfTag) };
}
