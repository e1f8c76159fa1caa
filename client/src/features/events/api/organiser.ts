import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventKeys } from './events';

export interface ComingItem {
  id: number;
  categoryName: string;
  skill: string;
  brand: string | null;
  model: string | null;
  ageYears: number | null;
  fault: string;
  mains: boolean;
  photoIds: number[];
}
export interface ComingBooking {
  id: number;
  reference: string;
  status: 'confirmed' | 'cancelled';
  visitorName: string;
  visitorEmail: string;
  visitorPhone: string | null;
  slotId: number;
  slotStartsAt: string;
  items: ComingItem[];
}
export interface Coming {
  bookings: ComingBooking[];
  waiting: {
    id: number;
    slotId: number;
    visitorName: string;
    places: number;
    status: string;
    offerExpiresAt: string | null;
  }[];
  summary: {
    items: number;
    bookings: number;
    mains: number;
    byCategory: { name: string; count: number }[];
    bySkill: { name: string; count: number }[];
  };
}
export const useEventBookings = (id: number) =>
  useQuery({ queryKey: eventKeys.bookings(id), queryFn: () => api<Coming>('GET', `/api/events/${id}/bookings`) });

export interface Venue {
  id: number;
  groupId: number;
  name: string;
  address: string;
  town: string;
  accessNotes: string;
}
export const useVenues = (groupId: number) =>
  useQuery({ queryKey: ['venues', groupId], queryFn: () => api<Venue[]>('GET', `/api/venues?groupId=${groupId}`) });
export function useCreateVenue(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: Omit<Venue, 'id'>) => api<Venue>('POST', '/api/venues', v),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['venues', groupId] }),
  });
}

export interface GroupSettings {
  id: number;
  name: string;
  town: string;
  timeZone: string;
  houseRules: string;
  excludedCategoryIds: number[];
}
export const useGroupSettings = (groupId: number) =>
  useQuery({
    queryKey: ['group-settings', groupId],
    queryFn: () => api<GroupSettings>('GET', `/api/groups/${groupId}/settings`),
  });
export function useSaveGroupSettings(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (s: { houseRules: string; excludedCategoryIds: number[] }) =>
      api('PUT', `/api/groups/${groupId}/settings`, s),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: ['group-settings', groupId] });
      qc.invalidateQueries({ queryKey: eventKeys.all });
    },
  });
}
