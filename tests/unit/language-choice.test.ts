import { afterEach, describe, expect, it, vi } from 'vitest';
import { pickInitialLanguage } from '../../client/src/lib/language-choice';

/** The browser's address and languages, as the early-language script and the app both read them. */
function browser(search: string, languages: string[]) {
  vi.stubGlobal('location', { search });
  vi.stubGlobal('navigator', { languages, language: languages[0] });
}

afterEach(() => vi.unstubAllGlobals());

describe('The language a page starts in (read before the entry runs, and again by the app)', () => {
  it('takes ?lang=, then the stored choice, then the browser, then English', () => {
    browser('?lang=fr', ['de-DE']);
    expect(pickInitialLanguage('nl')).toEqual({ lang: 'fr', guessed: false });
    browser('', ['de-DE', 'en']);
    expect(pickInitialLanguage('nl')).toEqual({ lang: 'nl', guessed: false });
    expect(pickInitialLanguage(null)).toEqual({ lang: 'de', guessed: false });
    browser('', ['pt-BR', 'nl-BE']);
    expect(pickInitialLanguage(null)).toEqual({ lang: 'nl', guessed: false });
  });

  it('says when English is only a guess, and takes the pseudo-locale only from the address', () => {
    browser('', ['pt-BR', 'ja']);
    expect(pickInitialLanguage(null)).toEqual({ lang: 'en', guessed: true });
    browser('?lang=xx-pseudo', ['fr-FR']);
    expect(pickInitialLanguage('de')).toEqual({ lang: 'xx-pseudo', guessed: false });
    browser('', ['fr-FR']);
    expect(pickInitialLanguage('xx-pseudo')).toEqual({ lang: 'fr', guessed: false });
  });
});
