/** Recomputes what depends on a plan's stations after an edit: markings, kit, totals, notices. */
import type { Notice, Phase, Plan, RuleParameters } from '../../shared/types';
import { finishPhase } from '../build/build-phase';
import { summarize } from '../build/summary';

/** Warning codes the phase and summary steps produce; rebuilt from scratch on every edit. */
const DERIVED_CODES = new Set([
  'no-target',
  'gates-for-goals',
  'shots-toward-station',
  'balls-short',
  'station-without-ball',
  'bibs-short',
  'touches-below-target',
]);

export function refreshPlan(
  plan: Plan,
  phases: Phase[],
  params: RuleParameters,
  checks: Notice[] = [],
): Plan {
  const band = params.ageGroups[plan.request.ageGroup].band;
  const warnings: Notice[] = plan.warnings.filter(
    (w) => !DERIVED_CODES.has(w.code) && !w.code.startsWith('check:'),
  );
  const fresh = phases.map((p) => ({ ...p, stations: p.stations.map((s) => ({ ...s })) }));
  for (const phase of fresh) finishPhase(phase.stations, params, plan.request, band, warnings, phase.name);
  const totals = summarize(fresh, params, plan.request.minutes, warnings);
  for (const c of checks) warnings.push({ ...c, code: `check:${c.code}` });
  return { ...plan, phases: fresh, ...totals, warnings };
}
