import type * as WorkbenchApi from '../../../../../shared/api/workbench';
import type { Json } from '../../../../../shared/api/json';

/** The workbench answers as the client receives them (dates as ISO strings); shared/api/workbench defines them. */
export type QueueItem = Json<WorkbenchApi.QueueItem>;
