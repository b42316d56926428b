export type { RevisionMailContext } from './context';
export type { RenderedEmail } from './message';
export { escapeHtml } from './escape-html';
export { reviewRequestedEmail } from './review-requested';
export { reviewOutcomeEmail } from './review-outcome';
export { releasedToFabEmail } from './released-to-fab';
export { mentionEmail } from './mention';
