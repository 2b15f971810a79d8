import type { Role } from '@shared/schemas/user';

/** The invented people of the demo scenario: the Saltmarsh Guild of Clockmakers. All sign in with DEMO_PASSWORD. */
export const DEMO_PASSWORD = 'tickwright-demo';
export const DEMO_DOMAIN = 'saltmarsh-guild.test';

export interface DemoPerson {
  key: string;
  name: string;
  role: Role;
  /** Which demo class the person mentors or is enrolled in. */
  cls?: 'autumn' | 'spring';
}

export const DEMO_PEOPLE: DemoPerson[] = [
  { key: 'office', name: 'Guild Office', role: 'admin' },
  { key: 'odile', name: 'Odile Marchetti', role: 'mentor', cls: 'autumn' },
  { key: 'bram', name: 'Bram Okafor', role: 'mentor', cls: 'spring' },
  { key: 'ned', name: 'Ned Pellow', role: 'apprentice', cls: 'autumn' },
  { key: 'ruth', name: 'Ruth Ashdown', role: 'apprentice', cls: 'autumn' },
  { key: 'tamsin', name: 'Tamsin Quarrell', role: 'apprentice', cls: 'autumn' },
  { key: 'jago', name: 'Jago Penhallow', role: 'apprentice', cls: 'autumn' },
  { key: 'wren', name: 'Wren Halloran', role: 'apprentice', cls: 'autumn' },
  { key: 'elias', name: 'Elias Brindlecombe', role: 'apprentice', cls: 'autumn' },
  { key: 'mabli', name: 'Mabli Treharne', role: 'apprentice', cls: 'spring' },
  { key: 'osric', name: 'Osric Fenwright', role: 'apprentice', cls: 'spring' },
  { key: 'perpetua', name: 'Perpetua Lowe', role: 'apprentice', cls: 'spring' },
  { key: 'caspian', name: 'Caspian Merryweather', role: 'apprentice', cls: 'spring' },
  { key: 'linnet', name: 'Linnet Sowerby', role: 'apprentice', cls: 'spring' },
  { key: 'hollis', name: 'Hollis Dunstable', role: 'apprentice', cls: 'spring' },
  // Finished "Springs and Heat Treatment" in an earlier class (EARLIER_CLASS), enrolled there by seed-record.
  { key: 'morwenna', name: 'Morwenna Trelease', role: 'apprentice' },
];

export const demoEmail = (key: string) => `${key}@${DEMO_DOMAIN}`;

export const DEMO_CLASSES = {
  autumn: {
    name: 'Autumn Bench 2026',
    course: 'going-train-wall-regulator',
    startsOn: '2026-09-07',
    endsOn: '2026-12-18',
    capacity: 12,
  },
  spring: {
    name: 'Spring Bench 2027',
    course: 'springs-heat-treatment',
    startsOn: '2027-03-01',
    endsOn: '2027-06-25',
    capacity: 10,
  },
} as const;

/** An earlier class, archived since it ended: its apprentice holds the demo's certificate. */
export const EARLIER_CLASS = {
  name: 'Spring Bench 2026',
  course: 'springs-heat-treatment',
  startsOn: '2026-03-02',
  endsOn: '2026-06-26',
  capacity: 8,
  mentor: 'bram',
  apprentice: 'morwenna',
} as const;

/** Bench time each demo class asks for per week, in minutes (an invented figure for the demo). */
export const REQUIRED_MINUTES_PER_WEEK = 480;
