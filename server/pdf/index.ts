export { renderPlanPdf } from './render-pdf';
export {
  planCardDefinition,
  PAPERS,
  GOAL_SAFETY_NOTE,
  STANDING_SAFETY_NOTE,
  type CardInput,
  type Paper,
} from './plan-card';
export { printable } from './printable';
