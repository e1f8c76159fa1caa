import { randomBytes } from 'node:crypto';
import { and, count, eq } from 'drizzle-orm';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import sharp from 'sharp';
import { PHOTO_LIMITS } from '../../../shared/schemas/bookings';
import type { AppContext } from '../context';
import { bookingItems, itemPhotos } from '../db/schema/index';
import { HttpError, notFound } from '../http/errors';

/** multer keeps uploads in memory within hard limits; nothing touches the disk until the content is checked. */
export const photoUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_LIMITS.maxBytes, files: PHOTO_LIMITS.perItem, fields: 5, parts: PHOTO_LIMITS.perItem + 5 },
}).array('photos', PHOTO_LIMITS.perItem);

export function multerError(err: unknown): HttpError | null {
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

/**
 * Checks each file by its bytes (not its name or the browser's word), then stores it re-encoded: at most
 * 1600 px, turned upright, with every metadata block (location included) left out.
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
    .select()
    .from(bookingItems)
    .where(and(eq(bookingItems.id, itemId), eq(bookingItems.bookingId, bookingId)));
  if (!item) throw notFound('That item');
  if (!files.length) throw new HttpError(400, 'no-photo', 'Choose a photo to add.');
  const [{ n }] = await db
    .select({ n: count() })
    .from(itemPhotos)
    .where(and(eq(itemPhotos.itemId, itemId), eq(itemPhotos.kind, kind)));
  if (n + files.length > PHOTO_LIMITS.perItem)
    throw new HttpError(
      400,
      'too-many-photos',
      `An item can have at most ${PHOTO_LIMITS.perItem} photos; this one has ${n}.`,
    );

  const prepared = [];
  for (const f of files) {
    const type = await fileTypeFromBuffer(f.buffer);
    if (!type || !(PHOTO_LIMITS.types as readonly string[]).includes(type.mime)) {
      throw new HttpError(415, 'photo-type', `“${f.originalname}” is not a JPEG, PNG or WebP photo.`);
    }
    try {
      const { data, info } = await sharp(f.buffer, { failOn: 'error' })
        .rotate()
        .resize({ width: 1600, height: 1600, fit: 'inside', withoutEnlargement: true })
        .jpeg({ quality: 82, mozjpeg: true })
        .toBuffer({ resolveWithObject: true });
      prepared.push({ data, info });
    } catch {
      throw new HttpError(415, 'photo-type', `“${f.originalname}” could not be read as a photo.`);
    }
  }
  const saved = [];
  for (const p of prepared) {
    const key = `photos/${new Date().toISOString().slice(0, 7)}/${randomBytes(12).toString('hex')}.jpg`;
    await ctx.storage.put(key, p.data, 'image/jpeg');
    const [{ id }] = await db
      .insert(itemPhotos)
      .values({
        itemId,
        kind,
        storageKey: key,
        contentType: 'image/jpeg',
        width: p.info.width,
        height: p.info.height,
        bytes: p.data.length,
      })
      .$returningId();
    saved.push({ id, kind, width: p.info.width, height: p.info.height });
  }
  return saved;
}
