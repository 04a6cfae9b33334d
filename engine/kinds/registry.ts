/**
 * Every station kind's module, by kind: the one place that knows which file owns a kind.
 * Adding a kind is one file plus its entry here, its tables in the rule set and its activities.
 */
import type { StationKind } from '../../shared/types';
import { ballMastery } from './ball-mastery';
import { coolDown } from './cool-down';
import { directionalPossession } from './directional-possession';
import { duel } from './duel';
import { goalkeeping } from './goalkeeping';
import { keepBall } from './keep-ball';
import type { KindLayout, KindModule } from './kind-module';
import { movementPrep } from './movement-prep';
import { passingFinishing } from './passing-finishing';
import { passingPattern } from './passing-pattern';
import { receivingTurning } from './receiving-turning';
import { shootingGame } from './shooting-game';
import { smallSidedGame } from './small-sided-game';
import { speed } from './speed';
import { tagGame } from './tag-game';
import { transition } from './transition';

const MODULES: Record<StationKind, KindModule> = {
  'ball-mastery': ballMastery,
  'tag-game': tagGame,
  duel,
  'receiving-turning': receivingTurning,
  'passing-pattern': passingPattern,
  'passing-finishing': passingFinishing,
  'shooting-game': shootingGame,
  'keep-ball': keepBall,
  'directional-possession': directionalPossession,
  transition,
  'small-sided-game': smallSidedGame,
  goalkeeping,
  speed,
  'movement-prep': movementPrep,
  'cool-down': coolDown,
};

export function kindModule(kind: StationKind): KindModule {
  return MODULES[kind];
}

/** The set-ups a kind draws, its default first. */
export function kindLayouts(kind: StationKind): readonly KindLayout[] {
  return MODULES[kind].layouts;
}

/** The activity's set-up: its own when the kind knows it, else the kind's default. */
export function layoutOf(activity: { kind: StationKind; layout?: string }): string {
  const layouts = MODULES[activity.kind].layouts;
  return layouts.find((l) => l.id === activity.layout)?.id ?? layouts[0].id;
}
