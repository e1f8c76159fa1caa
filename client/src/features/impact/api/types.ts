import type * as ImpactApi from '../../../../../shared/api/impact';
import type { Json } from '../../../../../shared/api/json';

/** The impact answers as the client receives them (dates as ISO strings); shared/api/impact defines them. */
export type Stats = Json<ImpactApi.Stats>;
export type Method = Json<ImpactApi.Method>;
export type RecordRow = Json<ImpactApi.RecordRow>;
export type RecordsPage = Json<ImpactApi.RecordsPage>;
export type PublicImpact = Json<ImpactApi.PublicImpact>;
export type EventReport = Json<ImpactApi.EventReport>;
export type FollowUp = Json<ImpactApi.FollowUp>;
export type RebookView = Json<ImpactApi.RebookView>;
export type ReturnBooked = Json<ImpactApi.ReturnBooked>;
export type ImpactSettings = Json<ImpactApi.ImpactSettings>;
