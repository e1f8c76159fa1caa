import { createDatabase } from '../src/db/client';
import { rebuildRollups } from '../src/features/impact/queries/cells';

/**
 * `node server/scripts/bootstrap.mjs stats-rebuild`: rewrites the statistics rollups (impact_cells per event,
 * impact_days for the network) from the records, in one transaction. The application keeps them exact itself; this is for rows changed by hand.
 */
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('Set DATABASE_URL to the database whose statistics to rebuild.');
  process.exit(2);
}
const database = createDatabase(url, 1);
const t = Date.now();
await rebuildRollups(database.db);
await database.close();
console.log(`Statistics rebuilt in ${((Date.now() - t) / 1000).toFixed(1)} s.`);
process.exit(0);
