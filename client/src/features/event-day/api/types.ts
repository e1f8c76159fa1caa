import type * as EventDay from '../../../../../shared/api/event-day';
import type { Json } from '../../../../../shared/api/json';

/** The event-day answers as the client receives them (dates as ISO strings); shared/api/event-day defines them. */
export type DeskEvent = Json<EventDay.DeskEvent>;
export type DeskView = Json<EventDay.DeskView>;
export type DeskBooking = Json<EventDay.DeskBooking>;
export type IssuedItem = Json<EventDay.IssuedItem>;
export type CheckInResult = Json<EventDay.CheckInResult>;
export type WalkInResult = Json<EventDay.WalkInResult>;
export type SafetyCheckResult = Json<EventDay.SafetyCheckResult>;
export type SafetyCheckRecord = Json<EventDay.SafetyCheckRecord>;
export type ItemView = Json<EventDay.ItemView>;
export type HallQueue = Json<EventDay.HallQueue>;
export type LiveCard = Json<EventDay.LiveCard>;
export type LiveView = Json<EventDay.LiveView>;
export type Tag = Json<EventDay.Tag>;
export type TagSheet = Json<EventDay.TagSheet>;
export type PublicTag = Json<EventDay.PublicTag>;
