import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalendarLinkStatus } from '../../../../../shared/api/rota';
import { api } from '../../../lib/api';
import { rotaKeys } from './keys';

export const getCalendarLink = () => api<CalendarLinkStatus>('GET', '/api/me/calendar-link');

export const calendarLinkQuery = () => queryOptions({ queryKey: rotaKeys.calendarLink(), queryFn: getCalendarLink });

/** Whether the person has a live shift-calendar link (never the link itself: only its hash is kept). */
export const useCalendarLink = () => useQuery(calendarLinkQuery());
