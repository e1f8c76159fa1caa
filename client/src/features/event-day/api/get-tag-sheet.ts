import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { eventDayKeys } from './keys';
import type { TagSheet } from './types';

/** A slot's tags, some items' tags, or (neither given) every tag of the event. */
export interface TagSheetFilter {
  slotId?: number;
  items?: number[];
}

const sheetParams = (f: TagSheetFilter) =>
  f.slotId ? { slotId: f.slotId } : f.items?.length ? { items: f.items.join(',') } : {};

export const getTagSheet = (eventId: number, f: TagSheetFilter) =>
  api<TagSheet>('GET', `/api/events/${eventId}/tags${queryString(sheetParams(f))}`);

export const tagSheetQuery = (eventId: number, f: TagSheetFilter) =>
  queryOptions({ queryKey: eventDayKeys.tags(eventId, sheetParams(f)), queryFn: () => getTagSheet(eventId, f) });

export const useTagSheet = (eventId: number, f: TagSheetFilter) => useQuery(tagSheetQuery(eventId, f));
