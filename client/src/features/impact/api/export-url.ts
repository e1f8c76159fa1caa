import type { StatsFilter } from '../../../../../shared/api/impact';
import { queryString } from '../../../lib/query-string';

/** The address of a CSV download for the filter; the browser fetches it, so this is a link, not a query. */
export const exportUrl = (kind: 'open-repair-data' | 'open-repair-data-unpowered' | 'records', f: StatsFilter) =>
  `/api/exports/${kind}.csv${queryString(f)}`;
