import type { Skill } from '../constants';
import type { ItemStatus, Outcome } from '../event-day/constants';

/* The bookings API's answers as the client reads them (dates as ISO strings). */

export interface BookingCreated {
  reference: string;
  manageToken: string;
  eventId: number;
  slotId: number;
  itemIds: number[];
}
/** The page behind a booking's QR code: whether the reference stands, and nothing about the visitor. */
export interface BookingCodeStatus {
  reference: string;
  status: 'confirmed' | 'cancelled';
}
export interface BookingView {
  reference: string;
  status: 'confirmed' | 'cancelled';
  visitor: { name: string; email: string; phone: string | null };
  event: {
    id: number;
    title: string;
    status: string;
    startsAt: string;
    endsAt: string;
    groupName: string;
    timeZone: string;
    houseRules: string;
  };
  venue: { name: string; address: string; town: string; accessNotes: string };
  slot: { id: number; startsAt: string; endsAt: string };
  items: {
    id: number;
    categoryName: string;
    skill: Skill;
    brand: string | null;
    model: string | null;
    ageYears: number | null;
    fault: string;
    mains: boolean;
    status: ItemStatus;
    queueNumber: number | null;
    outcome: Outcome | null;
    /** `url`: a signed address good for 10 to 15 minutes (the page refetches before then). */
    photos: { id: string; width: number; height: number; url: string }[];
  }[];
  /** The booking's calendar file: a signed address good for 10 to 15 minutes. */
  calendarUrl: string;
  qr: string;
}

export interface OfferView {
  status: 'waiting' | 'offered' | 'claimed' | 'expired' | 'withdrawn';
  expiresAt: string | null;
  places: number;
  visitorName: string;
  event: { id: number; title: string; groupName: string; timeZone: string };
  venue: { name: string; address: string; town: string };
  slot: { startsAt: string; endsAt: string };
}
