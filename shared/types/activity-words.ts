/**
 * Words and colours for the engine's activity codes, shared by the screens and the printed card
 * so both say and draw the same thing.
 */
import '../i18n/localize';
import type { ActivityKind, PositionRole } from './plan';
import type { Focus } from './plan-request';

export const ACTIVITY_KIND_LABELS: Record<ActivityKind, string> = {
  'ball-mastery': $localize`:kind of activity:Ball mastery`,
  'tag-game': $localize`:kind of activity:Tag game`,
  duel: $localize`:kind of activity:1v1 duels`,
  'receiving-turning': $localize`:kind of activity:Receive and turn`,
  'passing-pattern': $localize`:kind of activity:Passing practice`,
  'passing-finishing': $localize`:kind of activity:Passing and finishing`,
  'shooting-game': $localize`:kind of activity:Shooting game`,
  'keep-ball': $localize`:kind of activity:Keep-ball`,
  'directional-possession': $localize`:kind of activity:Possession to a target`,
  transition: $localize`:kind of activity:Transition game`,
  'small-sided-game': $localize`:kind of activity:Small-sided game`,
  goalkeeping: $localize`:kind of activity:Goalkeepers’ warm-up`,
  speed: $localize`:kind of activity:Speed`,
  'movement-prep': $localize`:kind of activity:Movement preparation`,
  'cool-down': $localize`:kind of activity:Cool-down`,
  break: $localize`:kind of activity:Drinks break`,
};

export const FOCUS_LABELS: Record<Focus, string> = {
  passing: $localize`:focus of a session:Passing`,
  receiving: $localize`:focus of a session:Receiving`,
  dribbling: $localize`:focus of a session:Dribbling`,
  '1v1': $localize`:focus of a session:1v1`,
  finishing: $localize`:focus of a session:Finishing`,
  pressing: $localize`:focus of a session:Pressing`,
  possession: $localize`:focus of a session:Possession`,
  transition: $localize`:focus of a session:Transition`,
  goalkeeping: $localize`:focus of a session:Goalkeeping`,
  speed: $localize`:focus of a session:Speed`,
};

/**
 * How each start position is drawn: its fill, the number's colour (4.5:1 or better against the
 * fill, WCAG 2.1 AA) and its legend words.
 */
export const POSITION_STYLE: Record<PositionRole, { fill: string; text: string; label: string }> = {
  player: { fill: '#0b4f56', text: '#ffffff', label: $localize`:diagram legend:Player` },
  attacker: { fill: '#21508f', text: '#ffffff', label: $localize`:diagram legend:Attacker` },
  defender: { fill: '#b8342a', text: '#ffffff', label: $localize`:diagram legend:Defender (bib)` },
  goalkeeper: { fill: '#f2c230', text: '#1b1b1b', label: $localize`:diagram legend:Goalkeeper` },
  'team-a': { fill: '#b84d17', text: '#ffffff', label: $localize`:diagram legend:Side A (bibs)` },
  'team-b': { fill: '#21508f', text: '#ffffff', label: $localize`:diagram legend:Side B` },
  server: { fill: '#6b3d98', text: '#ffffff', label: $localize`:diagram legend:Server` },
  neutral: { fill: '#5f6b66', text: '#ffffff', label: $localize`:diagram legend:Neutral` },
  coach: { fill: '#ffffff', text: '#1b1b1b', label: $localize`:diagram legend:Coach` },
};

/** Colours of the kit in a diagram. */
export const MARKER_STYLE = {
  cone: '#e8742a',
  goal: '#2b2b2b',
  gate: '#e8742a',
  zone: 'rgba(242, 194, 48, 0.25)',
  line: '#ffffff',
} as const;
