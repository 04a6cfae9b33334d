/**
 * Balls and bibs for a phase's stations, never more than the bag holds: first what lets
 * everyone play without waiting, shared fairly, then spares. Waiting is counted honestly from
 * the places and the balls each station ends up with.
 */
import '../../shared/i18n/localize';
import type { ActivityDefinition, Station } from '../../shared/types';
import { kindModule } from '../kinds/registry';
import type { DerivedNotices } from './derived-notices';

export function equipPhase(
  stations: Station[],
  activities: ActivityDefinition[],
  kit: { balls: number; bibs: number },
  warnings: DerivedNotices,
  phaseName: string,
  cold = false,
): void {
  const needs = stations.map((s, i) => kindModule(s.activityKind).balls(activities[i], s));
  const first = share(
    needs.map((n) => n.needed),
    kit.balls,
  );
  const spares = share(
    needs.map((n) => n.spare),
    kit.balls - first.given.reduce((s, x) => s + x, 0),
  );
  const bibs = share(
    stations.map((s) => kindModule(s.activityKind).bibs(s)),
    kit.bibs,
  );
  stations.forEach((s, i) => {
    s.equipment = { ...s.equipment, balls: first.given[i] + spares.given[i], bibs: bibs.given[i] };
    s.waiting = kindModule(s.activityKind).waiting(s, activities[i]);
  });
  if (first.short > 0) {
    const waiting = stations.reduce((sum, s) => sum + (s.waiting ?? 0), 0);
    warnings.push({
      code: 'balls-short',
      message:
        waiting === 1
          ? $localize`${phaseName}:phaseName:: ${first.wanted}:wanted: balls would keep everyone busy, the bag has ${kit.balls}:balls:; 1 player shares a ball in turns.`
          : $localize`${phaseName}:phaseName:: ${first.wanted}:wanted: balls would keep everyone busy, the bag has ${kit.balls}:balls:; ${waiting}:waiting: players share a ball in turns.`,
    });
  }
  // Waiting is told, not hidden: more than one at a station, or anyone at all in the cold.
  const limit = cold ? 0 : 1;
  const over = stations.filter((s) => (s.waiting ?? 0) > limit);
  if (over.length && first.short === 0) {
    const n = over.reduce((sum, s) => sum + (s.waiting ?? 0), 0);
    warnings.push({
      code: 'waiting',
      message: waitingMessage(phaseName, n, cold),
    });
  }
  if (stations.some((s, i) => s.equipment.balls === 0 && needs[i].needed > 0)) {
    warnings.push({
      code: 'station-without-ball',
      message: $localize`${phaseName}:phaseName:: some stations have no ball at all.`,
    });
  }
  if (bibs.short > 0) {
    warnings.push({
      code: 'bibs-short',
      message:
        bibs.wanted === 1
          ? $localize`${phaseName}:phaseName:: 1 bib needed, ${kit.bibs}:bibs: in the bag — use shirt colours to tell sides apart.`
          : $localize`${phaseName}:phaseName:: ${bibs.wanted}:wanted: bibs needed, ${kit.bibs}:bibs: in the bag — use shirt colours to tell sides apart.`,
    });
  }
}

/** Players waiting for a turn in a phase, told as a whole sentence for each case. */
function waitingMessage(phaseName: string, n: number, cold: boolean): string {
  if (n === 1)
    return cold
      ? $localize`${phaseName}:phaseName:: 1 player waits for a turn in the cold — keep them busy (juggling, fetching balls) and swap often.`
      : $localize`${phaseName}:phaseName:: 1 player waits for a turn — keep them busy (juggling, fetching balls) and swap often.`;
  return cold
    ? $localize`${phaseName}:phaseName:: ${n}:waiting: players wait for a turn in the cold — keep them busy (juggling, fetching balls) and swap often.`
    : $localize`${phaseName}:phaseName:: ${n}:waiting: players wait for a turn — keep them busy (juggling, fetching balls) and swap often.`;
}

function share(demand: number[], available: number): { given: number[]; wanted: number; short: number } {
  const given = demand.map(() => 0);
  const wanted = demand.reduce((s, d) => s + d, 0);
  let left = Math.max(0, Math.min(available, wanted));
  while (left > 0) {
    for (let i = 0; i < demand.length && left > 0; i++) {
      if (given[i] < demand[i]) {
        given[i]++;
        left--;
      }
    }
  }
  return { given, wanted, short: Math.max(0, wanted - available) };
}
