import type { ImportJobView } from '../../../../shared/api/imports';
import {
  IMPORT_LIMITS,
  kindForRecord,
  outcomeForStatus,
  slugForIdentifier,
} from '../../../../shared/impact/ords-import';
import {
  decodeCsv,
  fileKind,
  preview,
  readRecords,
  rowRefusal,
  UnreadableFile,
  type ImportField,
  type ImportedRecord,
} from '../../../../shared/impact/ords-reader';
import { scrubPersonalData } from '../../../../shared/privacy/scrub';
import type { AppContext } from '../../context';
import { isDuplicate, withDeadlockRetry } from '../../db/retry';
import { HttpError } from '../../http/errors';
import { translate } from '../../i18n';
import type { Language } from '../../../../shared/i18n/languages';
import { refreshEventCells } from './queries/cells';
import {
  claimJob,
  groupForIdentifier,
  insertJob,
  jobById,
  kindsForImport,
  knownKeys,
  recentJobs,
  sessionsForDates,
  setJob,
  writeItems,
  type ImportJob,
  type ItemToWrite,
} from './queries/imports';

const BATCH = 2000;
const LEASE_MS = 60_000;
const today = () => new Date().toISOString().slice(0, 10);

/** A file nothing can be read from, refused in the request's language (problems.<code>). */
function unreadable(err: unknown, lang: Language) {
  if (!(err instanceof UnreadableFile)) return err;
  const message = translate(lang, `problems.${err.code}`, err.values);
  return new HttpError(400, 'unreadable-file', message, { file: message });
}

/** The header and first rows of a file, and the matching our fields get by name, for the screen. */
export function previewFile(bytes: Buffer, lang: Language) {
  try {
    const { text, encoding } = decodeCsv(bytes);
    const p = preview(text);
    return { ...p, encoding, kind: fileKind(p.header) };
  } catch (err) {
    throw unreadable(err, lang);
  }
}

/**
 * Checks the file can be read with this matching (so a wrong file is refused at once, with its reason), keeps it,
 * and queues the job. The job writes the records; `kick` starts it in this process without waiting for the beat.
 */
export async function startImport(
  ctx: AppContext,
  input: {
    bytes: Buffer;
    fileName: string;
    scope: 'group' | 'network';
    groupId: number | null;
    mapping: Partial<Record<ImportField, string>>;
    userId: number;
  },
  lang: Language,
): Promise<number> {
  let text: string;
  let kind: string;
  try {
    text = decodeCsv(input.bytes).text;
    const read = readRecords(text, { mapping: input.mapping, today: today(), defaultProvider: 'file' });
    if (read.total > IMPORT_LIMITS.maxRows)
      throw new HttpError(413, 'too-many-rows', `A file can hold at most ${IMPORT_LIMITS.maxRows} records.`);
    if (input.scope === 'network' && read.kind === 'plain' && !input.mapping.group_identifier)
      throw new HttpError(400, 'invalid', 'errors.invalid', {
        mapping: 'Match a column to group_identifier: a network file names each record’s group.',
      });
    kind = read.kind;
  } catch (err) {
    throw unreadable(err, lang);
  }
  const id = await insertJob(ctx.database.db, {
    groupId: input.groupId,
    scope: input.scope,
    createdBy: input.userId,
    fileName: input.fileName.slice(0, 200),
    content: text,
    mapping: input.mapping as Record<string, string>,
    kind,
    refusals: [],
  });
  void runImports(ctx).catch((err: Error) => ctx.log(`import ${id} failed: ${err.message}`));
  return id;
}

/**
 * A job as the import page shows it. Each refused row carries its code and value, worded by the screen; a stopped
 * job's message is one of the server's own refusals (`problems`), given in the reader's language.
 */
export const toView = (j: NonNullable<Awaited<ReturnType<typeof jobById>>>, lang: Language): ImportJobView => ({
  id: j.id,
  groupId: j.groupId,
  scope: j.scope,
  fileName: j.fileName,
  kind: j.kind,
  status: j.status,
  total: j.total,
  imported: j.imported,
  skipped: j.skipped,
  refused: j.refusedCount,
  done: j.position,
  errors: j.refusals,
  message: j.message && translate(lang, j.message),
  createdAt: j.createdAt.toISOString(),
  finishedAt: j.finishedAt?.toISOString() ?? null,
});

export async function getImport(ctx: AppContext, id: number) {
  return jobById(ctx.database.db, id);
}
export const listImports = async (ctx: AppContext, groupId: number | null, lang: Language) =>
  (await recentJobs(ctx.database.db, groupId)).map((j) => toView(j, lang));

/** Per app (tests run several in one process): the run under way, so a kick while it works joins it. */
const running = new WeakMap<AppContext, Promise<number>>();

/**
 * The scheduled job: works through every waiting import, and any whose process stopped (its lease lapsed), batch by
 * batch from where it stood. One at a time per process; across processes the lease keeps each job to one.
 */
export function runImports(ctx: AppContext): Promise<number> {
  const under = running.get(ctx);
  if (under) return under;
  const run = (async () => {
    let n = 0;
    for (let job = await claimJob(ctx.database.db, LEASE_MS); job; job = await claimJob(ctx.database.db, LEASE_MS)) {
      await runJob(ctx, job);
      n++;
    }
    return n;
  })().finally(() => running.delete(ctx));
  running.set(ctx, run);
  return run;
}

async function runJob(ctx: AppContext, job: ImportJob) {
  const { db } = ctx.database;
  try {
    const read = readRecords(job.content, { mapping: job.mapping, today: today(), defaultProvider: 'file' });
    // A network file must say whose each record is; the same split on every resume, so `position` stays true.
    const records = job.scope === 'network' ? read.records.filter((r) => r.group) : read.records;
    const refused = [
      ...read.refused,
      ...read.records.filter((r) => !records.includes(r)).map((r) => rowRefusal(r.row, 'group_identifier', 'noGroup')),
    ].sort((a, b) => a.row - b.row);
    if (job.position === 0)
      await setJob(db, job.id, {
        total: read.total,
        refusedCount: refused.length,
        refusals: refused.slice(0, IMPORT_LIMITS.refusalsKept),
      });
    const kinds = await kindsForImport(db);
    const bySlug = new Map(kinds.map((k) => [k.slug, k]));
    for (let at = job.position; at < records.length; at += BATCH) {
      const batch = records.slice(at, at + BATCH);
      const counts = await writeBatch(ctx, job, at, batch, kinds, bySlug);
      job.imported += counts.imported;
      job.skipped += counts.skipped;
    }
    await setJob(db, job.id, { status: 'done', finishedAt: new Date(), leaseUntil: null });
  } catch (err) {
    ctx.log(`import ${job.id} stopped: ${(err as Error).message}`);
    await setJob(db, job.id, {
      status: 'failed',
      message:
        err instanceof UnreadableFile ? err.message : 'The import stopped on an error; records written so far stay.',
      finishedAt: new Date(),
      leaseUntil: null,
    });
  }
}

type Kinds = Awaited<ReturnType<typeof kindsForImport>>;

/** One batch in one transaction: its records, its sessions' figures and the job's counts, or none of them. */
async function writeBatch(
  ctx: AppContext,
  job: ImportJob,
  at: number,
  batch: ImportedRecord[],
  kinds: Kinds,
  bySlug: Map<string, Kinds[number]>,
) {
  for (let attempt = 1; ; attempt++) {
    try {
      return await withDeadlockRetry(() =>
        ctx.database.db.transaction(async (tx) => {
          const known = await knownKeys(tx, batch);
          const fresh = batch.filter((r) => !known.has(`${r.provider}\u0000${r.recordId}`));
          // Whose each record is, then the sessions of each group's dates, made together.
          const groups = new Map<string, number>();
          const groupOf = new Map<ImportedRecord, number>();
          for (const r of fresh) {
            if (job.scope !== 'network') {
              groupOf.set(r, job.groupId!);
              continue;
            }
            const slug = slugForIdentifier(r.group!);
            if (!groups.has(slug)) groups.set(slug, await groupForIdentifier(tx, slug, r.group!, r.country));
            groupOf.set(r, groups.get(slug)!);
          }
          const sessions = new Map<string, { eventId: number; bookingId: number }>();
          for (const g of new Set(groupOf.values())) {
            const dates = [...new Set(fresh.filter((r) => groupOf.get(r) === g).map((r) => r.eventDate))];
            for (const [d, s] of await sessionsForDates(tx, g, dates)) sessions.set(`${g}:${d}`, s);
          }
          const items: ItemToWrite[] = fresh.map((r) => {
            const kind = bySlug.get(kindForRecord(r, kinds)) ?? kinds[0];
            return {
              record: r,
              bookingId: sessions.get(`${groupOf.get(r)}:${r.eventDate}`)!.bookingId,
              categoryId: kind.id,
              mains: Boolean(kind.mains),
              fault: scrubPersonalData(r.problem),
              outcome: outcomeForStatus(r.status),
              at: new Date(`${r.eventDate}T12:00:00Z`),
              jobId: job.id,
            };
          });
          await writeItems(tx, items);
          await refreshEventCells(tx, [...new Set([...sessions.values()].map((s) => s.eventId))]);
          const imported = items.length;
          const skipped = batch.length - fresh.length;
          // The counts and the place to go on from move with the records, so a restart neither loses nor repeats.
          await setJob(tx, job.id, {
            imported: job.imported + imported,
            skipped: job.skipped + skipped,
            position: at + batch.length,
            leaseUntil: new Date(Date.now() + LEASE_MS),
          });
          return { imported, skipped };
        }),
      );
    } catch (err) {
      // Another process brought in one of these keys in the meantime: read the known keys again.
      if (!isDuplicate(err) || attempt >= 3) throw err;
    }
  }
}
