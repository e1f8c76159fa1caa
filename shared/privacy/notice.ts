/** A group's privacy page, written from its settings: what is kept, why, how long, and who to ask. */
export interface PrivacyNoticeInput {
  groupName: string;
  retentionMonths: number;
  contactEmail: string | null;
}

export interface PrivacyNotice {
  groupName: string;
  retentionMonths: number;
  contactEmail: string | null;
  sections: { heading: string; paragraphs: string[] }[];
}

const months = (n: number) => (n === 1 ? 'one month' : `${n} months`);

export function privacyNotice(g: PrivacyNoticeInput): PrivacyNotice {
  const ask = g.contactEmail
    ? `Write to ${g.contactEmail}, or ask an organiser at a session.`
    : 'Ask an organiser at one of our sessions.';
  return {
    groupName: g.groupName,
    retentionMonths: g.retentionMonths,
    contactEmail: g.contactEmail,
    sections: [
      {
        heading: 'What we keep',
        paragraphs: [
          'Your name, your e-mail address and, if you give it, a phone number.',
          'What you bring: its kind, brand, model and age, what is wrong with it, any photos you add, and how the repair went.',
        ],
      },
      {
        heading: 'Why',
        paragraphs: [
          'To hold your place at a session, send you the confirmation, a reminder and changes, and tell you if a part is needed.',
          'Repair results without your name are counted in our figures of what was mended and kept out of the bin.',
        ],
      },
      {
        heading: 'How long',
        paragraphs: [
          `${months(g.retentionMonths)} after your session, your name, e-mail address, phone number and photos are erased, and names, addresses and numbers are taken out of what you wrote about the fault. The repair record stays, without anything that points to you.`,
        ],
      },
      {
        heading: 'Your choices',
        paragraphs: [
          'The link in your confirmation mail lets you download everything we hold about your booking, or erase your details at any time. Mail still waiting to go to you is then not sent.',
        ],
      },
      { heading: 'Who to contact', paragraphs: [`${g.groupName} looks after your details. ${ask}`] },
    ],
  };
}
