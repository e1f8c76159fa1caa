import QRCode from 'qrcode';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import type { Language } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';
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
  /** The booking's language: every mail about it is in this language, whoever sends it. */
  language: Language;
}

/** What the QR code on a booking holds: the reception desk reads the reference from it. */
export const bookingQrText = (publicUrl: string, reference: string) => `${publicUrl}/b/${reference}`;

export const qrDataUrl = (text: string) => QRCode.toDataURL(text, { errorCorrectionLevel: 'M', margin: 2, width: 240 });

type Facts = Omit<BookingMailFacts, 'reference' | 'manageUrl'>;
/** A line of the mail catalog (locales/<language>/mail.json) in the booking's language. */
const m = (f: Pick<Facts, 'language'>, key: string, values?: Record<string, unknown>) =>
  translate(f.language, `mail.${key}`, values);
const when = (f: Facts) =>
  `${formatDay(f.slotStartsAt, f.timeZone, f.language)}, ${formatTimeRange(f.slotStartsAt, f.slotEndsAt, f.timeZone, f.language)}`;
const where = (f: Facts) => `${f.venue.name}, ${f.venue.address}, ${f.venue.town}`;
const hello = (f: Facts) => m(f, 'hello', { name: f.visitorName });

export function confirmationMail(f: BookingMailFacts, qrText: string) {
  const v = { event: f.eventTitle, group: f.groupName, reference: f.reference };
  const mail = composeMail(f.visitorEmail, m(f, 'confirmation.subject', v), {
    paragraphs: [
      hello(f),
      m(f, 'confirmation.booked', v),
      m(f, 'confirmation.qr'),
      m(f, 'when', { when: when(f) }),
      m(f, 'where', { where: where(f) }),
      m(f, 'bringing', { items: f.items.join('; ') }),
      m(f, 'pleaseBring'),
      m(f, 'disclaimer.guarantee'),
      m(f, 'disclaimer.owner'),
      m(f, 'disclaimer.safety'),
    ],
    image: { cid: 'booking-qr', alt: m(f, 'confirmation.qrAlt', v) },
    action: { label: m(f, 'bookingPage'), url: f.manageUrl },
    footnote: m(f, 'confirmation.footnote'),
    language: f.language,
  });
  mail.attachments = [{ filename: `booking-${f.reference}.png`, cid: 'booking-qr', contentType: 'image/png', qrText }];
  return mail;
}

export const reminderMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, m(f, 'reminder.subject', { event: f.eventTitle, reference: f.reference }), {
    paragraphs: [
      hello(f),
      m(f, 'reminder.text', { when: when(f), where: where(f) }),
      m(f, 'bringing', { items: f.items.join('; ') }),
      m(f, 'reminder.cancelPlease'),
    ],
    action: { label: m(f, 'reminder.action'), url: f.manageUrl },
    language: f.language,
  });

export const cancelledMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, m(f, 'cancelled.subject', { reference: f.reference }), {
    paragraphs: [hello(f), m(f, 'cancelled.text', { reference: f.reference, event: f.eventTitle, when: when(f) })],
    language: f.language,
  });

export const movedMail = (f: BookingMailFacts) =>
  composeMail(
    f.visitorEmail,
    m(f, 'moved.subject', {
      reference: f.reference,
      time: formatTimeRange(f.slotStartsAt, f.slotEndsAt, f.timeZone, f.language),
    }),
    {
      paragraphs: [hello(f), m(f, 'moved.text', { reference: f.reference, when: when(f), where: where(f) })],
      action: { label: m(f, 'moved.action'), url: f.manageUrl },
      language: f.language,
    },
  );

/** A fresh manage link asked for on the site; the links mailed before for this booking no longer work. */
export const freshLinkMail = (f: BookingMailFacts) =>
  composeMail(f.visitorEmail, m(f, 'freshLink.subject', { event: f.eventTitle, reference: f.reference }), {
    paragraphs: [
      hello(f),
      m(f, 'freshLink.text', {
        reference: f.reference,
        event: f.eventTitle,
        group: f.groupName,
        when: when(f),
        where: where(f),
      }),
      m(f, 'freshLink.old'),
    ],
    action: { label: m(f, 'bookingPage'), url: f.manageUrl },
    footnote: m(f, 'freshLink.footnote'),
    language: f.language,
  });

export const waitlistJoinedMail = (f: Facts, position: number) =>
  composeMail(f.visitorEmail, m(f, 'waitlist.subject', { event: f.eventTitle }), {
    paragraphs: [hello(f), m(f, 'waitlist.text', { when: when(f), position }), m(f, 'waitlist.offerLater')],
    language: f.language,
  });

export const offerMail = (f: Facts, claimUrl: string, expiresAt: Date) =>
  composeMail(f.visitorEmail, m(f, 'offer.subject', { event: f.eventTitle }), {
    paragraphs: [
      hello(f),
      m(f, 'offer.text', {
        event: f.eventTitle,
        when: when(f),
        until: `${formatDay(expiresAt, f.timeZone, f.language)} ${formatTime(expiresAt, f.timeZone, f.language)}`,
      }),
    ],
    action: { label: m(f, 'offer.action'), url: claimUrl },
    footnote: m(f, 'offer.footnote'),
    language: f.language,
  });
