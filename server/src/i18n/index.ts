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

/**
 * A message in `lang`. A text that is no catalog key comes back as it is, so a message not yet moved into the
 * catalogs still reads (in English).
 */
export function translate(lang: Language, keyOrText: string, values?: Values): string {
  const all = loadTranslations();
  const i18n = all[lang] ?? all[DEFAULT_LANGUAGE];
  if (keyOrText in i18n.messages) return i18n._(keyOrText, values);
  return keyOrText;
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
