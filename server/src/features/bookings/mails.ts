import QRCode from 'qrcode';
import { DISCLAIMER, formatDay, formatTimeRange, WHAT_TO_BRING } from '../../../../shared/format';
import { composeMail } from '../../mail/templates';

export interface BookingMailFacts {
  reference: string;
  visitorName: string;
  visitorEmail: string;
  eventTitle: string;
  groupName: string;
  timeZone: string;
  slotStartsAt: Date;
  slotEndsAt: Date;
  venue: { name: string; address: string; town: string };
  items: string[];
  manageUrl: string;
}

/** What the QR code on a booking holds: the reception desk reads the reference from it. */
export const bookingQrText = (publicUrl: string, reference: string) => `${publicUrl}/b/${reference}`;

export const qrDataUrl = (text: string) => QRCode.toDataURL(text, { errorCorrectionLevel: 'M', margin: 2, width: 240 });

const when = (f: BookingMailFacts) =>
  `${formatDay(f.slotStartsAt, f.timeZone)}, ${formatTimeRange(f.slotStartsAt, f.slotEndsAt, f.timeZone)}`;
const where = (f: BookingMailFacts) => `${f.venue.name}, ${f.venue.address}, ${f.venue.town}`;

export function confirmationMail(f: BookingMailFacts, qrText: string) {
  const mail = composeMail(f.visitorEmail, `Booked: ${f.eventTitle} — ${f.reference}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `your place at ${f.eventTitle} (${f.groupName}) is booked. Your booking reference is ${f.reference}. At the reception desk, show the reference or your QR code.`,
      'Your QR code is always on your booking page (the link below). It is in this mail as a picture too, if your mail program shows pictures.',
      `When: ${when(f)}.`,
      `Where: ${where(f)}.`,
      `You are bringing: ${f.items.join('; ')}.`,
      `Please bring: ${WHAT_TO_BRING.map((w, i) => (i ? w[0].toLowerCase() + w.slice(1) : w).replace(/\.$/, '')).join('; ')}.`,
      ...DISCLAIMER,
    ],
    image: { cid: 'booking-qr', alt: `Booking ${f.reference}` },
    action: { label: 'My booking page: QR code, move or cancel', url: f.manageUrl },
    footnote: 'Keep this mail: the link is the only way to change the booking without calling the group.',
  });
  mail.attachments = [{ filename: `booking-${f.reference}.png`, cid: 'booking-qr', contentType: 'image/png', qrText }];
  return mail;
}

export const reminderMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, `Tomorrow: ${f.eventTitle} — ${f.reference}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `a reminder of your repair slot: ${when(f)} at ${where(f)}.`,
      `You are bringing: ${f.items.join('; ')}.`,
      'If you cannot come, please cancel so someone on the waiting list can have the place.',
    ],
    action: { label: 'View or cancel my booking', url: f.manageUrl },
  });

export const cancelledMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, `Cancelled: your booking ${f.reference}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `your booking ${f.reference} for ${f.eventTitle} (${when(f)}) is cancelled. Thank you for letting us know; the place goes to someone else.`,
    ],
  });

export const movedMail = (f: BookingMailFacts) =>
  composeMail(
    f.visitorEmail,
    `New time for ${f.reference}: ${formatTimeRange(f.slotStartsAt, f.slotEndsAt, f.timeZone)}`,
    {
      paragraphs: [
        `Hello ${f.visitorName},`,
        `your booking ${f.reference} now has a new time: ${when(f)} at ${where(f)}.`,
      ],
      action: { label: 'View my booking', url: f.manageUrl },
    },
  );

/** A fresh manage link asked for on the site; the links mailed before for this booking no longer work. */
export const freshLinkMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, `Your booking link: ${f.eventTitle} — ${f.reference}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `someone asked on the Mendery site for a fresh link to your booking ${f.reference}: ${f.eventTitle} (${f.groupName}), ${when(f)} at ${where(f)}.`,
      'The links we mailed you before for this booking no longer work; use the one below.',
    ],
    action: { label: 'My booking page: QR code, move or cancel', url: f.manageUrl },
    footnote: 'If you did not ask for this, you need do nothing: only this mailbox has the new link.',
  });

export const waitlistJoinedMail = (f: Omit<BookingMailFacts, 'reference' | 'manageUrl'>, position: number) =>
  composeMail(f.visitorEmail, `Waiting list: ${f.eventTitle}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `the time you chose (${when({ ...f, reference: '', manageUrl: '' })}) is full, so you are number ${position} on its waiting list.`,
      'If a place frees up we mail you a link to take it. The offer lasts a limited time, so keep an eye on your mail.',
    ],
  });

export const offerMail = (f: Omit<BookingMailFacts, 'reference' | 'manageUrl'>, claimUrl: string, expiresAt: Date) =>
  composeMail(f.visitorEmail, `A place is free: ${f.eventTitle}`, {
    paragraphs: [
      `Hello ${f.visitorName},`,
      `a place has come free at ${f.eventTitle}: ${when({ ...f, reference: '', manageUrl: '' })}. It is kept for you until ${formatDay(expiresAt, f.timeZone)} ${formatTimeRange(expiresAt, expiresAt, f.timeZone).split('–')[0]}.`,
    ],
    action: { label: 'Take the place', url: claimUrl },
    footnote: 'If you no longer need it, do nothing: the place goes to the next person when the offer runs out.',
  });
