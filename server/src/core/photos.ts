import { randomBytes } from 'node:crypto';
import { mkdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { and, count, eq } from 'drizzle-orm';
import type { NextFunction, Request, Response } from 'express';
import { fileTypeFromFile } from 'file-type';
import multer from 'multer';
import sharp from 'sharp';
import { PHOTO_LIMITS } from '../../../shared/schemas/bookings';
import type { AppContext } from '../context';
import { bookingItems, itemPhotos } from '../db/schema/index';
import { withDeadlockRetry } from '../db/retry';
import { HttpError, notFound } from '../http/errors';

/** A photo wider or taller than this many pixels in all is refused before it is decoded (a decompression bomb). */
export const MAX_INPUT_PIXELS = 40_000_000;

/** Uploads stream to a temporary file each, within hard limits; nothing is kept in memory or stored until checked. */
const multerUpload = multer({
  storage: multer.diskStorage({
    // Asked per request, so a test may point TMPDIR elsewhere.
    destination: (_req, _file, cb) => {
      const dir = path.join(os.tmpdir(), 'mendery-uploads');
      mkdir(dir, { recursive: true }).then(
        () => cb(null, dir),
        (err: Error) => cb(err, dir),
      );
    },
    filename: (_req, _file, cb) => cb(null, randomBytes(16).toString('hex')),
  }),
  limits: { fileSize: PHOTO_LIMITS.maxBytes, files: PHOTO_LIMITS.perItem, fields: 5, parts: PHOTO_LIMITS.perItem + 5 },
}).array('photos', PHOTO_LIMITS.perItem);

const removeFiles = (files: unknown) => {
  if (Array.isArray(files)) for (const f of files as Express.Multer.File[]) void rm(f.path, { force: true });
};

/** Reads the upload to temporary files, and removes them once the answer has gone, whatever it was. */
export function photoUpload(req: Request, res: Response, next: (err?: unknown) => void) {
  res.once('close', () => removeFiles(req.files));
  multerUpload(req, res, next as NextFunction);
}

/** What busboy throws for a body it cannot split into parts (no boundary, a broken header, a cut-off body). */
const BUSBOY_REFUSAL = /^(Multipart: |Unsupported content type|Malformed |Unexpected end of )/;

export function multerError(err: unknown): HttpError | null {
  if (err instanceof Error && !(err instanceof multer.MulterError) && BUSBOY_REFUSAL.test(err.message))
    return new HttpError(400, 'bad-upload', 'The upload could not be read. Send the photos as a multipart form.');
  if (!(err instanceof multer.MulterError)) return null;
  if (err.code === 'LIMIT_FILE_SIZE')
    return new HttpError(
      413,
      'photo-too-large',
      `Each photo can be at most ${PHOTO_LIMITS.maxBytes / 1024 / 1024} MB.`,
    );
  if (err.code === 'LIMIT_FILE_COUNT' || err.code === 'LIMIT_UNEXPECTED_FILE')
    return new HttpError(400, 'too-many-photos', `Add at most ${PHOTO_LIMITS.perItem} photos per item.`);
  return new HttpError(400, 'bad-upload', 'The upload could not be read. Try again with fewer or smaller photos.');
}

const tooMany = (n: number) =>
  new HttpError(409, 'too-many-photos', `An item can have at most ${PHOTO_LIMITS.perItem} photos; this one has ${n}.`);

/** Checks each file by its bytes and decodes it within a pixel limit: at most 1600 px, upright, no metadata. */
async function prepare(f: Express.Multer.File) {
  const type = await fileTypeFromFile(f.path);
  if (!type || !(PHOTO_LIMITS.types as readonly string[]).includes(type.mime)) {
    throw new HttpError(415, 'photo-type', `“${f.originalname}” is not a JPEG, PNG or WebP photo.`);
  }
  try {
    return await sharp(f.path, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS })
      .rotate()
      .resize({ width: 1600, height: 1600, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 82, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
  } catch (err) {
    if (/pixel limit/i.test(String((err as Error)?.message)))
      throw new HttpError(413, 'photo-too-large', `“${f.originalname}” has too many pixels to be a photo.`);
    throw new HttpError(415, 'photo-type', `“${f.originalname}” could not be read as a photo.`);
  }
}

/**
 * Decodes every file first (slow, outside any lock), then counts and stores in one transaction that holds the
 * item's row, so concurrent uploads to one item cannot pass the limit together.
 */
export async function savePhotos(
  ctx: AppContext,
  bookingId: number,
  itemId: number,
  files: Express.Multer.File[],
  kind: 'intake' | 'repair' = 'intake',
) {
  const { db } = ctx.database;
  const [item] = await db
    .select({ id: bookingItems.id })
    .from(bookingItems)
    .where(and(eq(bookingItems.id, itemId), eq(bookingItems.bookingId, bookingId)));
  if (!item) throw notFound('That item');
  if (!files.length) throw new HttpError(400, 'no-photo', 'Choose a photo to add.');
  const countNow = async () => {
    const [{ n }] = await db
      .select({ n: count() })
      .from(itemPhotos)
      .where(and(eq(itemPhotos.itemId, itemId), eq(itemPhotos.kind, kind)));
    return n;
  };
  // A cheap early refusal; the transaction below is what holds the limit.
  const before = await countNow();
  if (before + files.length > PHOTO_LIMITS.perItem) throw tooMany(before);

  const prepared: Awaited<ReturnType<typeof prepare>>[] = [];
  for (const f of files) prepared.push(await prepare(f));
  const keys = prepared.map(
    () => `photos/${new Date().toISOString().slice(0, 7)}/${randomBytes(12).toString('hex')}.jpg`,
  );
  for (let i = 0; i < prepared.length; i++) await ctx.storage.put(keys[i], prepared[i].data, 'image/jpeg');
  try {
    return await withDeadlockRetry(() =>
      db.transaction(async (tx) => {
        await tx.select({ id: bookingItems.id }).from(bookingItems).where(eq(bookingItems.id, itemId)).for('update');
        const [{ n }] = await tx
          .select({ n: count() })
          .from(itemPhotos)
          .where(and(eq(itemPhotos.itemId, itemId), eq(itemPhotos.kind, kind)));
        if (n + prepared.length > PHOTO_LIMITS.perItem) throw tooMany(n);
        const saved = [];
        for (let i = 0; i < prepared.length; i++) {
          const p = prepared[i];
          const publicId = randomBytes(16).toString('base64url');
          await tx.insert(itemPhotos).values({
            publicId,
            itemId,
            kind,
            storageKey: keys[i],
            contentType: 'image/jpeg',
            width: p.info.width,
            height: p.info.height,
            bytes: p.data.length,
          });
          saved.push({ id: publicId, kind, width: p.info.width, height: p.info.height });
        }
        return saved;
      }),
    );
  } catch (err) {
    await Promise.all(keys.map((k) => ctx.storage.delete(k).catch(() => undefined)));
    throw err;
  }
}
