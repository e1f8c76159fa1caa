/* The admin API's answers as the client reads them (dates as ISO strings). */

export interface MailSummary {
  id: number;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
}
export interface MailDetail extends MailSummary {
  text: string | null;
  hasHtml: boolean;
}
export interface OutboxView {
  totals: Partial<Record<'pending' | 'sent' | 'failed', number>>;
  recent: {
    id: number;
    to: string;
    subject: string;
    status: string;
    attempts: number;
    lastError: string | null;
    createdAt: string;
    sentAt: string | null;
    nextAttemptAt: string;
  }[];
}
export interface AdminGroup {
  id: number;
  name: string;
  town: string;
  members: number;
  /** Made by a network import for records only; an admin may merge it into the group it belongs to. */
  historyOnly: boolean;
}
export interface AdminUser {
  id: number;
  name: string;
  email: string;
  admin: boolean;
  verified: boolean;
}
