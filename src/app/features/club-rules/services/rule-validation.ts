/** One problem in a rule-set document, at a JSON pointer. */
export interface RuleProblem {
  pointer: string;
  message: string;
}

type Validate = (value: unknown) => { ok: boolean; errors: RuleProblem[] };
let validator: Promise<Validate> | null = null;

/** The engine's own rule-set check, loaded only when a lead opens the editor. */
export function loadRuleValidator(): Promise<Validate> {
  validator ??= import('../../../../../engine/schema/validate-rule-set').then((m) => m.validateRuleSet);
  return validator;
}
