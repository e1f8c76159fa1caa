import fc from 'fast-check';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Malformed requests for the fuzz test, built with fast-check from fixed seeds. The field names come from the shared
 * schemas, so a generated body often has the right keys with the wrong kind of value and gets past the first check.
 */
export const FIELD_NAMES: string[] = (() => {
  const dir = path.resolve('shared/schemas');
  const names = new Set<string>();
  for (const f of readdirSync(dir))
    for (const m of readFileSync(path.join(dir, f), 'utf8').matchAll(
      /\b([a-zA-Z][a-zA-Z0-9]*)\s*:\s*(?:z\.|text\(|[a-zA-Z]+Schema\b)/g,
    ))
      names.add(m[1]);
  return [...names].sort();
})();

const PROTOTYPE_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf'];
const LONE = ['\ud800', 'a\udc00b', '\udfff\ud800'];
const DATES = [
  '2026-02-30',
  '2026-13-01T25:61:00Z',
  '9999-12-31T23:59:59Z',
  '+275760-09-13T00:00:00.001Z',
  '-271821-04-19T00:00:00Z',
  '0000-00-00',
  '1970-01-01T00:00:00Z',
  'tomorrow',
  '2026-12-04T10:00:00+99:00',
];
const NUMBER_TEXTS = ['NaN', 'Infinity', '-Infinity', '1e309', '-1', '0', '-0', '1.5', '0x10', '99999999999999999999'];
const NUMBERS = [-1, 0, -0, 0.5, 1.5, 2 ** 31, 2 ** 53 + 1, 1e308, -1e308, Number.MAX_SAFE_INTEGER, Number.MIN_VALUE];

/** An object whose keys may repeat or be prototype names: kept as entries and written out by `json`. */
class Entries {
  constructor(public entries: [string, unknown][]) {}
}
const entriesObject = (e: [string, unknown][]) => new Entries(e);

/** One awkward value: a scalar, a string from an odd corner, or a small nested structure. */
export const weirdValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.constantFrom<unknown>(null, true, false, '', ' ', '\u0000', '<b>x</b>', '=1+1', '@SUM(A1)', ...LONE, ...DATES),
    fc.constantFrom<unknown>(...NUMBER_TEXTS, ...NUMBERS),
    fc.integer({ min: -5, max: 2_000_000 }),
    fc.double(),
    fc.string({ unit: 'binary', maxLength: 40 }),
    fc.string({ unit: 'grapheme', maxLength: 60 }),
    fc.constantFrom(300, 1_000, 10_000, 60_000).map((n) => 'é'.repeat(n)),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.array(fc.tuple(fieldName(), tie('value')), { maxLength: 4 }).map(entriesObject),
  ),
})).value;

function fieldName() {
  return fc.oneof(
    { weight: 6, arbitrary: fc.constantFrom(...FIELD_NAMES) },
    { weight: 1, arbitrary: fc.constantFrom(...PROTOTYPE_KEYS) },
    { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 12 }) },
  );
}

/** JSON text that keeps repeated and prototype keys as written (JSON.stringify of an object would drop them). */
export function json(v: unknown): string {
  if (v instanceof Entries) return `{${v.entries.map(([k, x]) => `${JSON.stringify(k)}:${json(x)}`).join(',')}}`;
  if (Array.isArray(v)) return `[${v.map(json).join(',')}]`;
  return JSON.stringify(v) ?? 'null';
}

/** A body: mostly an object of schema field names with awkward values, sometimes something that is no object. */
export const weirdBody: fc.Arbitrary<string> = fc
  .oneof(
    {
      weight: 8,
      arbitrary: fc.array(fc.tuple(fieldName(), weirdValue), { minLength: 1, maxLength: 8 }).map(entriesObject),
    },
    { weight: 1, arbitrary: weirdValue },
  )
  .map(json);

export type RawCase = { contentType: string; body: string | Buffer; encoding?: string };

/** Bodies that break at the transport: nesting, truncation, charsets, encodings, content types. */
export const rawCase: fc.Arbitrary<RawCase> = fc.oneof(
  fc
    .integer({ min: 50, max: 20_000 })
    .map((d) => ({ contentType: 'application/json', body: '['.repeat(d) + ']'.repeat(d) })),
  fc
    .integer({ min: 50, max: 5_000 })
    .map((d) => ({ contentType: 'application/json', body: '{"a":'.repeat(d) + '1' + '}'.repeat(d) })),
  weirdBody.map((b) => ({ contentType: 'application/json', body: b.slice(0, Math.max(1, b.length - 2)) })),
  fc
    .constantFrom('utf-7', 'latin1', 'klingon', 'utf-16')
    .map((cs) => ({ contentType: `application/json; charset=${cs}`, body: '{"name":"x"}' })),
  fc.constantFrom('gzip', 'deflate', 'br', 'zstd', 'x-bogus').map((encoding) => ({
    contentType: 'application/json',
    body: Buffer.from([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 3, 1, 2, 3]),
    encoding,
  })),
  fc
    .constantFrom('text/plain', 'multipart/form-data', 'application/x-www-form-urlencoded', 'application/xml')
    .map((contentType) => ({ contentType, body: 'name=%E0%A4%A&a[b][c]=1&__proto__[x]=1' })),
  fc.constant({ contentType: 'application/json', body: Buffer.from([0xff, 0xfe, 0xfd, 0x7b, 0x7d]) }),
);

/** Percent-encodes text, writing a lone surrogate as the bytes of one (which no UTF-8 decoder accepts). */
export const pct = (s: string) =>
  encodeURIComponent(s.replace(/\p{Surrogate}/gu, '\u0001S\u0001')).replace(/%01S%01/g, '%ED%A0%80');

/** Path parameters and query values that a router or a parser might choke on. */
export const weirdSegment: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    '%ff',
    '%',
    '%E0%A4%A',
    '%ED%A0%80',
    '-1',
    '0',
    '1e3',
    '99999999999999999999',
    'NaN',
    '%00',
    '..%2f..',
    'null',
    '1.5',
    ' 1',
    '%20',
  ),
  fc.string({ unit: 'grapheme-ascii', maxLength: 20 }).map(pct),
  fc.constantFrom(300, 3_000).map((n) => 'x'.repeat(n)),
);

export const weirdQuery: fc.Arbitrary<string> = fc
  .array(
    fc.tuple(
      fc.oneof(
        fc.constantFrom(...FIELD_NAMES),
        fc.constantFrom('token', 'groupId', 'from', 'to', 'slotId', 'items', 'q', 'a[b]', '__proto__'),
      ),
      fc.oneof(
        weirdSegment,
        fc.constantFrom(...DATES, ...NUMBER_TEXTS).map(pct),
        weirdValue.map((v) => pct(typeof v === 'string' ? v : json(v))),
      ),
    ),
    { minLength: 1, maxLength: 5 },
  )
  .map((pairs) => pairs.map(([k, v]) => `${pct(k)}=${v}`).join('&'));
