import type { Language } from '../i18n/languages';
import type { GroupRole, MembershipStatus } from '../constants';

/* The groups API's answers as the client reads them (dates as ISO strings). */

export interface PublicGroup {
  id: number;
  name: string;
  slug: string;
  town: string;
  description: string;
}
export interface Member {
  membershipId: number;
  userId: number;
  name: string;
  email: string;
  role: GroupRole;
  status: MembershipStatus;
  since: string;
  verified: boolean;
}
export interface GroupMembers {
  group: { id: number; name: string; town: string };
  members: Member[];
}
export interface Invitation {
  groupName: string;
  role: GroupRole;
  email: string;
  hasAccount: boolean;
}
export interface Venue {
  id: number;
  groupId: number;
  name: string;
  address: string;
  town: string;
  accessNotes: string;
}
/** The group's own rules: what it takes and what visitors agree to. */
export interface GroupSettings {
  id: number;
  name: string;
  town: string;
  timeZone: string;
  /** ISO 4217 code in which the group's part costs are shown. */
  currency: string;
  /** The language of the group's mails when a visitor's own is not known (walk-ins at the desk). */
  defaultLanguage: Language;
  /** ISO 3166-1 alpha-3 code, or '' until an organiser chooses one. */
  country: string;
  houseRules: string;
  excludedCategoryIds: number[];
  /** Where visitors write about their details, or ''. */
  contactEmail: string;
  /** How long visitors' details are kept, and the retention job's last run for the group. */
  retention: { months: number; lastRunAt: string | null; lastRunAnonymised: number };
}
