import { compileMessageOrThrow, type CompiledMessage } from '@lingui/message-utils/compileMessage';

/**
 * Message catalogs. Each language has one folder under `locales/` with one JSON file per area (namespace):
 * `locales/<language>/<namespace>.json`, a flat object from key to ICU MessageFormat text. Every key starts with its
 * namespace and a dot (`booking.submit` lives in booking.json), so the files of a language merge without clashes.
 * Lingui's runtime (@lingui/core) formats compiled messages; the compiler comes from @lingui/message-utils, at build
 * time for the browser (see vite.config.ts) and at start for the server.
 */
export type RawCatalog = Record<string, string>;
export type CompiledCatalog = Record<string, CompiledMessage>;

/** Compiles one language's merged catalog; `mapText` changes only the words (the pseudo-locale), never placeholders. */
export function compileCatalog(raw: RawCatalog, mapText?: (text: string) => string): CompiledCatalog {
  const out: CompiledCatalog = {};
  for (const [key, message] of Object.entries(raw)) out[key] = compileMessageOrThrow(message, mapText);
  return out;
}

/** Merges a language's namespace files into one catalog, refusing a key outside its namespace or given twice. */
export function mergeNamespaces(files: Record<string, RawCatalog>): RawCatalog {
  const merged: RawCatalog = {};
  for (const [namespace, catalog] of Object.entries(files)) {
    for (const [key, message] of Object.entries(catalog)) {
      if (!key.startsWith(`${namespace}.`))
        throw new Error(`${namespace}.json: the key "${key}" must start with "${namespace}."`);
      if (key in merged) throw new Error(`The key "${key}" is given twice`);
      merged[key] = message;
    }
  }
  return merged;
}
