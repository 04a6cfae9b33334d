import type { Role } from '../../shared/types/api';
import type { AgeGroup, Equipment, Level, PlanKind, Space } from '../../shared/types/plan-request';
import type { ScheduleKind } from '../../shared/types/schedule';

/**
 * The demo scenario: an invented club with invented people, for local use only. Players are a
 * first name and an initial, as the product stores them.
 */
export const DEMO_PASSWORD = 'conewise-demo';

export const DEMO_CLUB = 'Fernmoor Juniors';

export interface DemoPerson {
  name: string;
  email: string;
  role: Role;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  { name: 'Morag Ellison', email: 'lead@fernmoor.example.org', role: 'lead' },
  { name: 'Tomasz Reid', email: 'coach.u8@fernmoor.example.org', role: 'coach' },
  { name: 'Ayesha Brandt', email: 'coach.u12@fernmoor.example.org', role: 'coach' },
  { name: 'Femi Okonjo', email: 'assistant@fernmoor.example.org', role: 'assistant' },
];

export interface DemoTeam {
  name: string;
  ageGroup: AgeGroup;
  level: Level;
  usualSpace: Space;
  kit: Equipment;
  /** E-mails of the staff attached to the team. */
  staff: string[];
  players: { displayName: string; goalkeeper?: boolean }[];
  /** Past sessions: days before today, kind, minutes, kick-off, how many of the squad came. */
  pastPlans: { daysAgo: number; kind: PlanKind; minutes: number; kickOff: string; present: number }[];
  /** The team's week: each on the schedule for the next DEMO_SCHEDULE_WEEKS (weekday 0 = Sunday). */
  week: { weekday: number; startTime: string; kind: ScheduleKind; minutes: number; place: string }[];
}

/** How many weeks of the demo teams' schedules are seeded, from the day of seeding. */
export const DEMO_SCHEDULE_WEEKS = 6;

export const DEMO_TEAMS: DemoTeam[] = [
  {
    name: 'U8 Foxes',
    ageGroup: 'U8',
    level: 'beginner',
    usualSpace: { width: 25, length: 30 },
    kit: { balls: 12, cones: 40, bibs: 12, goals: 4 },
    staff: ['coach.u8@fernmoor.example.org', 'assistant@fernmoor.example.org'],
    players: [
      { displayName: 'Ada K.' },
      { displayName: 'Bilal S.' },
      { displayName: 'Carys M.' },
      { displayName: 'Dev P.' },
      { displayName: 'Elin W.' },
      { displayName: 'Finn O.' },
      { displayName: 'Grace T.', goalkeeper: true },
      { displayName: 'Hamza R.' },
      { displayName: 'Isla B.' },
      { displayName: 'Jonah L.' },
      { displayName: 'Kemi A.' },
    ],
    pastPlans: [
      { daysAgo: 10, kind: 'training', minutes: 45, kickOff: '17:30', present: 10 },
      { daysAgo: 4, kind: 'match-warm-up', minutes: 15, kickOff: '09:45', present: 9 },
    ],
    week: [
      { weekday: 3, startTime: '17:30', kind: 'training', minutes: 45, place: 'Fernmoor Rec, small pitch' },
      { weekday: 6, startTime: '09:45', kind: 'match', minutes: 15, place: 'Fernmoor Rec, small pitch' },
    ],
  },
  {
    name: 'U12 Otters',
    ageGroup: 'U12',
    level: 'intermediate',
    usualSpace: { width: 40, length: 50 },
    kit: { balls: 16, cones: 50, bibs: 16, goals: 4 },
    staff: ['coach.u12@fernmoor.example.org'],
    players: [
      { displayName: 'Aaron F.' },
      { displayName: 'Beatriz C.' },
      { displayName: 'Callum H.', goalkeeper: true },
      { displayName: 'Dara N.' },
      { displayName: 'Emeka J.' },
      { displayName: 'Freya G.' },
      { displayName: 'Gus D.' },
      { displayName: 'Hana Y.' },
      { displayName: 'Idris Q.' },
      { displayName: 'Jess V.' },
      { displayName: 'Kofi E.' },
      { displayName: 'Lotte Z.', goalkeeper: true },
      { displayName: 'Milo I.' },
      { displayName: 'Nadia U.' },
    ],
    pastPlans: [
      { daysAgo: 8, kind: 'training', minutes: 60, kickOff: '18:00', present: 13 },
      { daysAgo: 3, kind: 'match-warm-up', minutes: 20, kickOff: '10:30', present: 14 },
    ],
    week: [
      { weekday: 2, startTime: '18:00', kind: 'training', minutes: 60, place: 'Fernmoor Rec, pitch 2' },
      { weekday: 4, startTime: '18:00', kind: 'training', minutes: 60, place: 'Fernmoor Rec, pitch 2' },
      { weekday: 0, startTime: '10:30', kind: 'match', minutes: 20, place: 'Fernmoor Rec, pitch 1' },
    ],
  },
];
