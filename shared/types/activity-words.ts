/**
 * Words and colours for the engine's activity codes, shared by the screens and the printed card
 * so both say and draw the same thing.
 */
import type { ActivityKind, PositionRole } from './plan';
import type { Focus } from './plan-request';

export const ACTIVITY_KIND_LABELS: Record<ActivityKind, string> = {
  'ball-mastery': 'Ball mastery',
  'tag-game': 'Tag game',
  duel: '1v1 duels',
  'receiving-turning': 'Receive and turn',
  'passing-pattern': 'Passing practice',
  'passing-finishing': 'Passing and finishing',
  'shooting-game': 'Shooting game',
  'keep-ball': 'Keep-ball',
  'directional-possession': 'Possession to a target',
  transition: 'Transition game',
  'small-sided-game': 'Small-sided game',
  goalkeeping: 'Goalkeepers’ warm-up',
  speed: 'Speed',
  'movement-prep': 'Movement preparation',
  'cool-down': 'Cool-down',
  break: 'Drinks break',
};

export const FOCUS_LABELS: Record<Focus, string> = {
  passing: 'Passing',
  receiving: 'Receiving',
  dribbling: 'Dribbling',
  '1v1': '1v1',
  finishing: 'Finishing',
  pressing: 'Pressing',
  possession: 'Possession',
  transition: 'Transition',
  goalkeeping: 'Goalkeeping',
  speed: 'Speed',
};

/**
 * How each start position is drawn: its fill, the number's colour (4.5:1 or better against the
 * fill, WCAG 2.1 AA) and its legend words.
 */
export const POSITION_STYLE: Record<PositionRole, { fill: string; text: string; label: string }> = {
  player: { fill: '#0b4f56', text: '#ffffff', label: 'Player' },
  attacker: { fill: '#21508f', text: '#ffffff', label: 'Attacker' },
  defender: { fill: '#b8342a', text: '#ffffff', label: 'Defender (bib)' },
  goalkeeper: { fill: '#f2c230', text: '#1b1b1b', label: 'Goalkeeper' },
  'team-a': { fill: '#b84d17', text: '#ffffff', label: 'Side A (bibs)' },
  'team-b': { fill: '#21508f', text: '#ffffff', label: 'Side B' },
  server: { fill: '#6b3d98', text: '#ffffff', label: 'Server' },
  neutral: { fill: '#5f6b66', text: '#ffffff', label: 'Neutral' },
  coach: { fill: '#ffffff', text: '#1b1b1b', label: 'Coach' },
};

/** Colours of the kit in a diagram. */
export const MARKER_STYLE = {
  cone: '#e8742a',
  goal: '#2b2b2b',
  gate: '#e8742a',
  zone: 'rgba(242, 194, 48, 0.25)',
  line: '#ffffff',
} as const;
