import type { I18n } from '@lingui/core';
import { createElement, Fragment, useSyncExternalStore, type ReactNode } from 'react';
import { catalogs } from 'virtual:mendery-catalogs';
import { DEFAULT_LANGUAGE, isLanguage, type Language } from '../../../shared/i18n/languages';
import type { OnDemandNamespace } from '../../../shared/i18n/namespaces';
import { PSEUDO_LANGUAGE } from '../../../shared/i18n/pseudo';
import { pickInitialLanguage, STORAGE_KEY, type UiLanguage } from './language-choice';

/**
 * The reader's language in the browser. Lingui's runtime comes in the same lazy step as the language's precompiled
 * messages, so the first page waits for one small fetch that runs beside the page's own chunks (see main.tsx).
 */
export type { UiLanguage };
type Values = Record<string, unknown>;

let instance: I18n | undefined;
let formats: Language = DEFAULT_LANGUAGE;
const chosenListeners = new Set<(lang: Language) => void>();

/** The language for dates, numbers and the API's Accept-Language (the pseudo-locale formats as English). */
export const currentLanguage = (): Language => formats;

function storedLanguage(): string | null {
  try {
    const stored = localStorage.getItem(STORAGE_KEY);
    if (stored) tellServer(stored);
    return stored;
  } catch {
    return null;
  }
}

/**
 * The choice as a cookie too, read only by the server's page for a public landing: it then knows the page's language
 * before any script runs, and leaves out early API reads that would come back in the browser's language instead.
 */
function tellServer(lang: string) {
  document.cookie = `${STORAGE_KEY}=${encodeURIComponent(lang)}; path=/; max-age=31536000; samesite=lax`;
}

/** True while the language is English only because nothing told us better (see followGroupLanguage). */
let guessed = false;

/** ?lang= in the address, else the visitor's stored choice, else the browser's languages, else English. */
export function initialLanguage(): UiLanguage {
  const choice = pickInitialLanguage(storedLanguage());
  if (choice.lang !== PSEUDO_LANGUAGE) guessed = choice.guessed;
  return choice.lang;
}

/**
 * A group's own page, for a visitor whose browser speaks none of our languages and who has chosen none: the group's
 * language rather than English. Nothing is remembered; the picker still decides. `then` runs once the words are in.
 */
export function followGroupLanguage(lang: string | null | undefined, then: () => void): void {
  if (!guessed || !isLanguage(lang) || lang === formats) return;
  guessed = false;
  void activate(lang).then(then);
}

const fetchNamespace = (lang: UiLanguage, ns: OnDemandNamespace) =>
  import('virtual:mendery-catalogs-on-demand').then(({ onDemand }) => onDemand[lang][ns]());

/** The on-demand namespaces some page has asked for; a switch of language fetches them again in the new one. */
const wanted = new Map<OnDemandNamespace, Promise<void>>();
let target: UiLanguage | undefined;
let activation: Promise<void> = Promise.resolve();

/**
 * Loads the language's messages (and Lingui with the first one) with the on-demand namespaces asked for so far,
 * switches to it and sets `<html lang>`.
 */
export function activate(lang: UiLanguage): Promise<void> {
  target = lang;
  activation = (async () => {
    const [{ setupI18n }, { messages }, more] = await Promise.all([
      import('@lingui/core'),
      catalogs[lang](),
      Promise.all([...wanted.keys()].map((ns) => fetchNamespace(lang, ns))),
    ]);
    instance ??= setupI18n();
    formats = isLanguage(lang) ? lang : DEFAULT_LANGUAGE;
    instance.load(lang, Object.assign({}, messages, ...more.map((m) => m.messages)));
    instance.activate(lang, [formats]);
    document.documentElement.lang = isLanguage(lang) ? lang : 'en-XA';
  })();
  return activation;
}

/**
 * Fetches the words of on-demand namespaces (a page's own, see the router) in the current language and adds them to
 * it; resolves once they can be read. Asking again for one already here costs nothing.
 */
export function loadNamespaces(names: readonly OnDemandNamespace[]): Promise<void> {
  return Promise.all(
    names.map((ns) => {
      let loading = wanted.get(ns);
      if (!loading) {
        const lang = target ?? initialLanguage();
        loading = fetchNamespace(lang, ns).then(async ({ messages }) => {
          await activation;
          // Had the language changed meanwhile, its activation fetched this namespace too.
          if (instance?.locale === lang) instance.load(lang, messages);
        });
        // A failed fetch may be tried again by the next page that asks.
        loading.catch(() => wanted.delete(ns));
        wanted.set(ns, loading);
      }
      return loading;
    }),
  ).then(() => activation);
}

/**
 * The visitor picked a language: remember it on this device, switch, and tell whoever listens (a signed-in person's
 * account keeps it too: see onLanguageChosen).
 */
export async function chooseLanguage(lang: Language): Promise<void> {
  guessed = false;
  try {
    localStorage.setItem(STORAGE_KEY, lang);
    tellServer(lang);
  } catch {
    // A browser that keeps nothing still switches for this visit.
  }
  await activate(lang);
  for (const listener of chosenListeners) listener(lang);
}

/** Runs `listener` after each choice made in the language picker; returns the way to stop. */
export function onLanguageChosen(listener: (lang: Language) => void): () => void {
  chosenListeners.add(listener);
  return () => chosenListeners.delete(listener);
}

/** A message's text when `keyOrText` is a catalog key, else `keyOrText` itself (an API message already in words). */
export function tr(keyOrText: string, values?: Values): string {
  return instance && keyOrText in instance.messages ? instance._(keyOrText, values) : keyOrText;
}

const subscribe = (onChange: () => void) => instance!.on('change', onChange);
const locale = () => instance!.locale;

/** The translate function for a component; the component renders again when the language changes. */
export function useT(): (key: string, values?: Values) => string {
  useSyncExternalStore(subscribe, locale);
  return tr;
}

/** The active language (as for formats) for a component, kept current. */
export function useLanguage(): Language {
  const lang = useSyncExternalStore(subscribe, locale);
  return isLanguage(lang) ? lang : DEFAULT_LANGUAGE;
}

const MARK = '\u0000';

/**
 * A message with elements in it (a figure in bold, a subscript): each name in `parts` is a placeholder of the message
 * that is rendered as that element, in the place the language puts it. Other values fill in as text.
 */
export function trParts(key: string, parts: Record<string, ReactNode>, values?: Values): ReactNode[] {
  const marks = Object.fromEntries(Object.keys(parts).map((name) => [name, `${MARK}${name}${MARK}`]));
  return tr(key, { ...values, ...marks })
    .split(MARK)
    .map((piece, i) => (i % 2 ? createElement(Fragment, { key: i }, parts[piece]) : piece));
}
