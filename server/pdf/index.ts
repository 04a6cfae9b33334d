export { renderPlanPdf } from './render-pdf';
export { planCardDefinition, PAPERS, STANDING_SAFETY_NOTE, type CardInput, type Paper } from './plan-card';
