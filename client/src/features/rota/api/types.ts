import type * as RotaApi from '../../../../../shared/api/rota';
import type { Json } from '../../../../../shared/api/json';

/** The rota answers as the client receives them (dates as ISO strings); shared/api/rota defines them. */
export type Rota = Json<RotaApi.Rota>;
export type MyEvent = Json<RotaApi.MyEvent>;
export type ShiftAnswer = Json<RotaApi.ShiftAnswer>;
export type AskResult = Json<RotaApi.AskResult>;
export type SeatResult = Json<RotaApi.SeatResult>;
