import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { loadItem } from '../../core/items';
import { savePhotos } from '../../core/photos';
import { assertMayRecord } from './outcomes';

/** Only the fixer on the item or an organiser may add repair photos; asked before a byte of the upload is read. */
export async function assertMayAddRepairPhotos(ctx: AppContext, itemId: number, user: SessionUser) {
  const { db } = ctx.database;
  await assertMayRecord(db, await loadItem(db, itemId), user);
}

/** Repair photos are kept apart from the visitor's own (kind 'repair'). */
export async function addRepairPhotos(ctx: AppContext, itemId: number, files: Express.Multer.File[]) {
  const row = await loadItem(ctx.database.db, itemId);
  return savePhotos(ctx, row.booking.id, row.item.id, files, 'repair');
}
