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

/** A catalog lookup: the message of `key` in the reader's language, with its values filled in. */
export type Translate = (key: string, values?: Record<string, unknown>) => string;

/** The notice in the reader's language; the words are the `privacy` catalog's (locales/<language>/privacy.json). */
export function privacyNotice(g: PrivacyNoticeInput, t: Translate): PrivacyNotice {
  const section = (part: string, ...paragraphs: string[]) => ({ heading: t(`privacy.${part}.heading`), paragraphs });
  return {
    groupName: g.groupName,
    retentionMonths: g.retentionMonths,
    contactEmail: g.contactEmail,
    sections: [
      section('keep', t('privacy.keep.contact'), t('privacy.keep.item')),
      section('why', t('privacy.why.booking'), t('privacy.why.figures')),
      section('howLong', t('privacy.howLong.text', { months: g.retentionMonths })),
      section('choices', t('privacy.choices.text')),
      section(
        'contact',
        g.contactEmail
          ? t('privacy.contact.withEmail', { group: g.groupName, email: g.contactEmail })
          : t('privacy.contact.noEmail', { group: g.groupName }),
      ),
    ],
  };
}
