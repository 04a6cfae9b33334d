/** The default club rule set shipped with Conewise, typed. */
import type { RuleSetDocument } from '../shared/types';
import document from '../rules/default-rule-set.json';

export const defaultRuleSet: RuleSetDocument = document as RuleSetDocument;
