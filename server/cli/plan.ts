/**
 * `npm run -s plan -- request.json` (or `-` for stdin): prints the Plan JSON for a request;
 * `npm run -s plan -- --text request.json` prints it as a coach reads it (plan-text.ts).
 * An invalid request exits with status 2 and one line per bad field on stderr.
 */
import { readFileSync } from 'node:fs';
import { generatePlan, PlanRequestError, RuleSetError, validatePlanRequest } from '../../engine';
import type { PlanRequest } from '../../shared/types';
import { planText } from './plan-text';

const USAGE = 'usage: npm run -s plan -- [--text] <request.json | ->';

function readInput(arg: string | undefined): string {
  if (!arg) throw new UsageError(USAGE);
  try {
    return readFileSync(arg === '-' ? 0 : arg, 'utf8');
  } catch (error) {
    throw new UsageError(
      `cannot read ${arg === '-' ? 'stdin' : arg}: ${(error as NodeJS.ErrnoException).code ?? 'error'}`,
    );
  }
}

class UsageError extends Error {}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const asText = args[0] === '--text';
  let text: string;
  try {
    text = readInput(asText ? args[1] : args[0]);
  } catch (error) {
    process.stderr.write(`${(error as Error).message}\n`);
    return 2;
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    process.stderr.write(`(request): not valid JSON — ${(error as Error).message}\n`);
    return 2;
  }
  const validation = validatePlanRequest(value);
  if (!validation.ok) {
    for (const e of validation.errors) process.stderr.write(`${e.field}: ${e.message}\n`);
    return 2;
  }
  try {
    const plan = await generatePlan(value as PlanRequest);
    process.stdout.write(asText ? `${planText(plan)}\n` : `${JSON.stringify(plan, null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof PlanRequestError) {
      for (const e of error.errors) process.stderr.write(`${e.field}: ${e.message}\n`);
      return 2;
    }
    if (error instanceof RuleSetError) {
      for (const e of error.errors) process.stderr.write(`rule set ${e.pointer}: ${e.message}\n`);
      return 1;
    }
    process.stderr.write(`could not make a plan: ${(error as Error).message}\n`);
    return 1;
  }
}

main().then((code) => {
  process.exitCode = code;
});
