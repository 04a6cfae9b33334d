export { renderPlanPdf } from './render-pdf';
export {
  planCardDefinition,
  PAPERS,
  goalSafetyNote,
  standingSafetyNote,
  type CardInput,
  type Paper,
} from './plan-card';
export { printable } from './printable';
