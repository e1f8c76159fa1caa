import type { AppContext } from '../../context';
import type { QueueItem } from '../../../../shared/api/workbench';
import { eventLayout } from '../../core/benches';
import { photoIdsOf, queueRows } from './queries';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/** A fixer's own queue across upcoming events ("My bench"), in the order the items come. */
export async function myQueue(
  ctx: AppContext,
  userId: number,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<QueueItem[]> {
  const { db } = ctx.database;
  const rows = await queueRows(db, userId);
  const photos = await photoIdsOf(
    db,
    rows.map((r) => r.itemId),
  );
  const benchNames = new Map(
    (await Promise.all([...new Set(rows.map((r) => r.eventId))].map((e) => eventLayout(db, e))))
      .flat()
      .map((b) => [b.id, b.name]),
  );
  return rows.map(({ categorySlug, ...r }) => ({
    ...r,
    categoryName: categoryText(lang, categorySlug, 'name', r.categoryName),
    mains: Boolean(r.mains),
    locked: Boolean(r.locked),
    visitorName: r.visitorName.split(' ')[0],
    benchName: benchNames.get(r.benchId) ?? '',
    photoIds: photos.filter((p) => p.itemId === r.itemId).map((p) => p.id),
  }));
}
