import type { EventStatus, Skill } from '../constants';

/* The events API's answers as the client reads them (dates as ISO strings). */

export interface EventSummary {
  id: number;
  groupId: number;
  groupName: string;
  title: string;
  description: string;
  status: EventStatus;
  startsAt: string;
  endsAt: string;
  slotMinutes: number;
  slotCapacity: number;
  skillLimits: Partial<Record<Skill, number>>;
  timeZone: string;
  /** The group's own language ('en', 'nl', 'de', 'fr'): a visitor whose browser speaks none of ours reads it. */
  groupLanguage: string;
  venue: { id: number; name: string; address: string; town: string; accessNotes: string };
  totalPlaces: number;
  freePlaces: number;
}
export interface Slot {
  id: number;
  startsAt: string;
  endsAt: string;
  capacity: number;
  booked: number;
  held: number;
  free: number;
  skillTaken: Partial<Record<Skill, number>>;
}
export interface EventDetail extends EventSummary {
  houseRules: string;
  excludedCategoryIds: number[];
  slots: Slot[];
}

/** The public list's filters; the list always starts a day back so today's sessions stay on it. */
export interface EventFilters {
  groupId?: number;
  categoryId?: number;
}

/** What is coming to one event, for its organisers. */
interface ComingItem {
  id: number;
  categoryName: string;
  skill: string;
  brand: string | null;
  model: string | null;
  ageYears: number | null;
  fault: string;
  mains: boolean;
  photoIds: string[];
}
interface ComingBooking {
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
