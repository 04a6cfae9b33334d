/**
 * `npm run -s scenarios`: everyday squads planned with the default rules and printed as a coach
 * reads them (see plan-text.ts), to read before and after a change to the engine or the rules.
 * `--json` prints the plans instead; `--only N` one scenario.
 */
import { generatePlan } from '../../engine';
import type { PlanRequest } from '../../shared/types';
import { planText } from './plan-text';
import { EVERYDAY_SCENARIOS } from './everyday-scenarios';

async function main(): Promise<void> {
  const only = process.argv.indexOf('--only');
  const pick = only >= 0 ? Number(process.argv[only + 1]) : -1;
  const json = process.argv.includes('--json');
  for (const [i, s] of EVERYDAY_SCENARIOS.entries()) {
    if (pick >= 0 && i + 1 !== pick) continue;
    const plan = await generatePlan(s.request as PlanRequest);
    if (json) process.stdout.write(`${JSON.stringify(plan)}\n`);
    else process.stdout.write(`\n#${i + 1} ${s.name}\n${planText(plan)}\n`);
  }
}

void main();
