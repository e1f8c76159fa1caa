import type * as TriageApi from '../../../../../shared/api/triage';
import type { Json } from '../../../../../shared/api/json';

/** The triage answers as the client receives them (dates as ISO strings); shared/api/triage defines them. */
export type Board = Json<TriageApi.Board>;
export type BoardItem = Json<TriageApi.BoardItem>;
export type PlacementResult = Json<TriageApi.PlacementResult>;
export type TriageRunResult = Json<TriageApi.TriageRunResult>;
export type TriageRunDetail = Json<TriageApi.TriageRunDetail>;
