/** The e-mail preference switches, by form field name. */
export const PREFERENCE_FIELDS = {
  notifyReviewRequested: 'A revision waits for my review',
  notifyReviewOutcome: 'My revision is approved or needs changes',
  notifyReleased: 'A revision is released to fab',
  notifyMention: 'Someone mentions me in a comment',
} as const;
