import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { setupI18n, type I18n } from '@lingui/core';
import type { RequestHandler, Request } from 'express';
import { categoryTextKey, type CategoryTextField } from '../../../shared/i18n/category-text';
import { compileCatalog, mergeNamespaces, type RawCatalog } from '../../../shared/i18n/catalog';
import {
  acceptLanguageTags,
  DEFAULT_LANGUAGE,
  LANGUAGES,
  pickLanguage,
  type Language,
} from '../../../shared/i18n/languages';

/**
 * The server's messages (validation answers, error answers, mails) in the reader's language. Every language's
 * catalogs under locales/ are read and compiled once, at start; each language has its own Lingui instance.
 */
export const localesFolder = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../locales');

type Values = Record<string, unknown>;
let instances: Record<Language, I18n> | undefined;

function readLanguage(lang: Language): RawCatalog {
  const dir = path.join(localesFolder, lang);
  const files: Record<string, RawCatalog> = {};
  for (const f of readdirSync(dir)
    .filter((n) => n.endsWith('.json'))
    .sort())
    files[f.slice(0, -'.json'.length)] = JSON.parse(readFileSync(path.join(dir, f), 'utf8')) as RawCatalog;
  return mergeNamespaces(files);
}

/** Reads and compiles every language's catalogs (once; later calls reuse them). Throws on a broken catalog. */
export function loadTranslations(): Record<Language, I18n> {
  if (instances) return instances;
  const built = {} as Record<Language, I18n>;
  for (const lang of LANGUAGES) {
    const i18n = setupI18n();
    i18n.load(lang, compileCatalog(readLanguage(lang)));
    i18n.activate(lang);
    built[lang] = i18n;
  }
  instances = built;
  return built;
}

/** True when `key` is a message of the catalogs (English has every key; see tests/unit/catalogs.test.ts). */
export const isMessageKey = (key: string): boolean => key in loadTranslations()[DEFAULT_LANGUAGE].messages;

type Refusal = { key: string; pattern: RegExp };
let refusals: { exact: Map<string, string>; patterns: Refusal[] } | undefined;

/**
 * The API's refusals (HttpError messages) are written in English where they are thrown; the server-only `problems`
 * namespace holds each one's English wording as its English message. An English text is found again by its exact
 * words, or, for a message with `{placeholders}`, by a pattern whose holes give the values back ("Wait 15 minutes"
 * → minutes = 15), so the thrower needs no key and its English stays readable in the code and the tests.
 */
function refusalsFromEnglish() {
  if (refusals) return refusals;
  const raw = JSON.parse(
    readFileSync(path.join(localesFolder, DEFAULT_LANGUAGE, 'problems.json'), 'utf8'),
  ) as RawCatalog;
  const exact = new Map<string, string>();
  const patterns: Refusal[] = [];
  for (const [key, text] of Object.entries(raw)) {
    if (!/\{\w+\}/.test(text)) {
      exact.set(text, key);
      continue;
    }
    const source = text
      .split(/(\{\w+\})/)
      .map((part) =>
        /^\{\w+\}$/.test(part) ? `(?<${part.slice(1, -1)}>.+?)` : part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'),
      )
      .join('');
    patterns.push({ key, pattern: new RegExp(`^${source}$`, 's') });
  }
  refusals = { exact, patterns };
  return refusals;
}

/** The `problems` key and values of an English refusal, when the catalogs have it. */
function refusalOf(text: string): { key: string; values?: Values } | undefined {
  const { exact, patterns } = refusalsFromEnglish();
  const key = exact.get(text);
  if (key) return { key };
  for (const p of patterns) {
    const m = p.pattern.exec(text);
    if (!m?.groups) continue;
    // A number comes back as a number, so a language's plural rules apply to it.
    const values = Object.fromEntries(
      Object.entries(m.groups).map(([k, v]) => [k, /^\d+(\.\d+)?$/.test(v) ? Number(v) : v]),
    );
    return { key: p.key, values };
  }
  return undefined;
}

/**
 * A message in `lang`: a catalog key, or one of the API's English refusals (see refusalsFromEnglish). Any other text
 * comes back as it is, so a message not yet in the catalogs still reads (in English).
 */
export function translate(lang: Language, keyOrText: string, values?: Values): string {
  const all = loadTranslations();
  const i18n = all[lang] ?? all[DEFAULT_LANGUAGE];
  if (keyOrText in i18n.messages) return i18n._(keyOrText, values);
  if (lang === DEFAULT_LANGUAGE) return keyOrText;
  const refusal = refusalOf(keyOrText);
  return refusal ? i18n._(refusal.key, { ...refusal.values, ...values }) : keyOrText;
}

/** The request's language: the first supported one of its Accept-Language header, else English. */
export const requestLanguage = (req: Pick<Request, 'headers'>): Language =>
  pickLanguage(acceptLanguageTags(req.headers?.['accept-language']));

/** Gives each request its language, as res.locals.language, for routes and the error handler. */
export const languageMiddleware: RequestHandler = (req, res, next) => {
  res.locals.language = requestLanguage(req);
  next();
};

/** The language a middleware gave the request; the header's when the middleware has not run. */
export const languageOf = (req: Request, locals?: Record<string, unknown>): Language => {
  const l = locals?.language;
  return typeof l === 'string' && (LANGUAGES as readonly string[]).includes(l) ? (l as Language) : requestLanguage(req);
};

/** A kind of item's name or refusal text in `lang` while it is the seeded wording; an admin's own wording as typed. */
export function categoryText(lang: Language, slug: string, field: CategoryTextField, stored: string): string {
  const key = categoryTextKey(slug, field, stored);
  return key ? translate(lang, key) : stored;
}
