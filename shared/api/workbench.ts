import type { ItemStatus } from '../event-day/constants';

/** One item in the fixer's queue, in the order they take them. */
export interface QueueItem {
  itemId: number;
  status: ItemStatus;
  tagCode: string | null;
  queueNumber: number | null;
  eventId: number;
  eventTitle: string;
  timeZone: string;
  slotStartsAt: Date;
  reference: string;
  visitorName: string;
  categoryName: string;
  minutes: number;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  benchName: string;
  photoIds: string[];
}
