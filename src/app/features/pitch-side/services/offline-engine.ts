import type { Plan, PlayerMove, RosterChange, StationVerdict } from '../../../../../shared/types';

type Engine = typeof import('../../../../../engine/index');
let engine: Promise<Engine> | null = null;

/** The engine, loaded on the first pitch-side change so the screen opens fast. */
function load(): Promise<Engine> {
  engine ??= import('../../../../../engine/index');
  return engine;
}

/** Starts loading the engine while the network is still there, so it is cached for offline use. */
export function preloadEngine(): void {
  void load().catch(() => (engine = null));
}

/** Re-plans in the browser with the rules the plan was made with (the engine's own when unknown). */
export async function replanLocally(
  plan: Plan,
  change: RosterChange,
  rules: unknown,
): Promise<{ plan: Plan; moves: PlayerMove[] }> {
  const { replan, defaultRuleSet } = await load();
  return replan(plan, change, (rules as typeof defaultRuleSet | null) ?? defaultRuleSet);
}

/** Steps a station easier or harder in the browser; `refused` says why it could not, in plain words. */
export async function progressLocally(
  plan: Plan,
  phaseIndex: number,
  stationId: string,
  verdict: StationVerdict,
  rules: unknown,
): Promise<{ plan: Plan; refused: string | null }> {
  const { progressionOutcome, defaultRuleSet } = await load();
  return progressionOutcome(
    plan,
    phaseIndex,
    stationId,
    verdict,
    (rules as typeof defaultRuleSet | null) ?? defaultRuleSet,
  );
}
