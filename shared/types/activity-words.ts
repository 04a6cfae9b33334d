/**
 * Words and colours for the engine's activity codes, shared by the screens and the printed card
 * so both say and draw the same thing. The words are getters, made on each read, so the server
 * says them in the language of the request (the app's build holds each language's words).
 */
import '../i18n/localize';
import type { ActivityKind, PositionRole } from './plan';
import type { Focus } from './plan-request';

export const ACTIVITY_KIND_LABELS: Record<ActivityKind, string> = {
  get 'ball-mastery'() {
    return $localize`:kind of activity:Ball mastery`;
  },
  get 'tag-game'() {
    return $localize`:kind of activity:Tag game`;
  },
  get duel() {
    return $localize`:kind of activity:1v1 duels`;
  },
  get 'receiving-turning'() {
    return $localize`:kind of activity:Receive and turn`;
  },
  get 'passing-pattern'() {
    return $localize`:kind of activity:Passing practice`;
  },
  get 'passing-finishing'() {
    return $localize`:kind of activity:Passing and finishing`;
  },
  get 'shooting-game'() {
    return $localize`:kind of activity:Shooting game`;
  },
  get 'keep-ball'() {
    return $localize`:kind of activity:Keep-ball`;
  },
  get 'directional-possession'() {
    return $localize`:kind of activity:Possession to a target`;
  },
  get transition() {
    return $localize`:kind of activity:Transition game`;
  },
  get 'small-sided-game'() {
    return $localize`:kind of activity:Small-sided game`;
  },
  get goalkeeping() {
    return $localize`:kind of activity:Goalkeepers’ warm-up`;
  },
  get speed() {
    return $localize`:kind of activity:Speed`;
  },
  get 'movement-prep'() {
    return $localize`:kind of activity:Movement preparation`;
  },
  get 'cool-down'() {
    return $localize`:kind of activity:Cool-down`;
  },
  get break() {
    return $localize`:kind of activity:Drinks break`;
  },
};

export const FOCUS_LABELS: Record<Focus, string> = {
  get passing() {
    return $localize`:focus of a session:Passing`;
  },
  get receiving() {
    return $localize`:focus of a session:Receiving`;
  },
  get dribbling() {
    return $localize`:focus of a session:Dribbling`;
  },
  get '1v1'() {
    return $localize`:focus of a session:1v1`;
  },
  get finishing() {
    return $localize`:focus of a session:Finishing`;
  },
  get pressing() {
    return $localize`:focus of a session:Pressing`;
  },
  get possession() {
    return $localize`:focus of a session:Possession`;
  },
  get transition() {
    return $localize`:focus of a session:Transition`;
  },
  get goalkeeping() {
    return $localize`:focus of a session:Goalkeeping`;
  },
  get speed() {
    return $localize`:focus of a session:Speed`;
  },
};

/**
 * How each start position is drawn: its fill, the number's colour (4.5:1 or better against the
 * fill, WCAG 2.1 AA) and its legend words.
 */
export const POSITION_STYLE: Record<PositionRole, { fill: string; text: string; label: string }> = {
  player: {
    fill: '#0b4f56',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Player`;
    },
  },
  attacker: {
    fill: '#21508f',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Attacker`;
    },
  },
  defender: {
    fill: '#b8342a',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Defender (bib)`;
    },
  },
  goalkeeper: {
    fill: '#f2c230',
    text: '#1b1b1b',
    get label() {
      return $localize`:diagram legend:Goalkeeper`;
    },
  },
  'team-a': {
    fill: '#b84d17',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Side A (bibs)`;
    },
  },
  'team-b': {
    fill: '#21508f',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Side B`;
    },
  },
  server: {
    fill: '#6b3d98',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Server`;
    },
  },
  neutral: {
    fill: '#5f6b66',
    text: '#ffffff',
    get label() {
      return $localize`:diagram legend:Neutral`;
    },
  },
  coach: {
    fill: '#ffffff',
    text: '#1b1b1b',
    get label() {
      return $localize`:diagram legend:Coach`;
    },
  },
};

/** Colours of the kit in a diagram. */
export const MARKER_STYLE = {
  cone: '#e8742a',
  goal: '#2b2b2b',
  gate: '#e8742a',
  zone: 'rgba(242, 194, 48, 0.25)',
  line: '#ffffff',
} as const;
