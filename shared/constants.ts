/** Roles held within one repair group. A visitor needs no role (and no account); admin is platform-wide. */
export const GROUP_ROLES = ['organiser', 'host', 'fixer'] as const;
export type GroupRole = (typeof GROUP_ROLES)[number];

export const MEMBERSHIP_STATUSES = ['active', 'pending'] as const;
export type MembershipStatus = (typeof MEMBERSHIP_STATUSES)[number];

export const ROLE_LABELS: Record<GroupRole, string> = {
  organiser: 'Organiser',
  host: 'Reception',
  fixer: 'Fixer',
};

export const DEMO_PASSWORD = 'mendery-demo';

/** The trade's skill list; a fixer holds each at level 1 learning, 2 capable, 3 expert. */
export const SKILLS = [
  'electrical',
  'electronics',
  'computers',
  'phones',
  'textiles',
  'bikes',
  'woodwork',
  'toys',
  'jewellery',
  'mechanical',
] as const;
export type Skill = (typeof SKILLS)[number];
export const SKILL_LABELS: Record<Skill, string> = {
  electrical: 'Electrical',
  electronics: 'Electronics',
  computers: 'Computers',
  phones: 'Phones and tablets',
  textiles: 'Textiles',
  bikes: 'Bikes',
  woodwork: 'Woodwork',
  toys: 'Toys',
  jewellery: 'Jewellery',
  mechanical: 'Mechanical',
};

/** Bench equipment an item may need. */
export const EQUIPMENT = [
  'soldering-station',
  'multimeter',
  'appliance-safety-tester',
  'isolation-transformer',
  'sewing-machine',
  'bike-stand',
  'hot-air-station',
  'clamps',
] as const;
export type Equipment = (typeof EQUIPMENT)[number];
export const EQUIPMENT_LABELS: Record<Equipment, string> = {
  'soldering-station': 'Soldering station',
  multimeter: 'Multimeter',
  'appliance-safety-tester': 'Appliance safety tester',
  'isolation-transformer': 'Isolation transformer',
  'sewing-machine': 'Sewing machine',
  'bike-stand': 'Bike stand',
  'hot-air-station': 'Hot-air station',
  clamps: 'Clamps',
};

export const EVENT_STATUSES = ['draft', 'published', 'closed', 'cancelled'] as const;
export type EventStatus = (typeof EVENT_STATUSES)[number];

export const BOOKING_STATUSES = ['confirmed', 'cancelled'] as const;
export const WAITLIST_STATUSES = ['waiting', 'offered', 'claimed', 'expired', 'withdrawn'] as const;

/** Conditions that make an item unsafe to bring, whatever its category (common practice of repair groups). */
export const HAZARDS = ['swollen-battery', 'damaged-cable', 'gas'] as const;
export type Hazard = (typeof HAZARDS)[number];
