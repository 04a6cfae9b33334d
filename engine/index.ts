/** Conewise's engine: pure functions shared by the browser and the server. */
export { generatePlan, PlanRequestError } from './generate-plan';
export { validatePlanRequest, type FieldError, type RequestValidation } from './schema/validate-plan-request';
export { validateRuleSet, type PointerError, type RuleSetValidation } from './schema/validate-rule-set';
export { RuleSetError } from './club-rules/compile-rule-set';
export { upgradeRuleSet, isFirstFormat } from './club-rules/upgrade-rule-set';
export { defaultRuleSet } from './rule-sets';
export { checkPlan } from './check-plan';
export { applyEdit, tryEdit } from './edit/apply-edit';
export type { EditOutcome } from './edit/edit-outcome';
export { areaLimits, stepArea, type AreaLimits, type AreaSize } from './edit/area-step';
export { replan, type ReplanResult } from './edit/replan';
export { applyProgression, progressionOutcome } from './edit/apply-progression';
export { listActivities, type ActivityOption } from './list-activities';
export { suitsAge } from './planning/activities';
export { previewActivity, type ActivityPreview } from './preview-activity';
export { kindLayouts } from './kinds/registry';
export type { KindLayout } from './kinds/kind-module';
export type { RuleSetDocument, PlanEdit, PlayerMove, RosterChange, StationVerdict } from '../shared/types';
