/** How the Desk's activity list words each audit event; unknown events show their code. */
const ACTIVITY_WORDS: Record<string, string> = {
  'design.create': 'created a design',
  'design.edit': 'changed a design’s settings',
  'revision.save': 'saved a revision',
  'revision.retryExport': 'retried an export',
  'revision.requestReview': 'asked for a review',
  'revision.approve': 'approved a revision',
  'revision.requestChanges': 'requested changes',
  'revision.release': 'released a revision to fab',
  'revision.markFabricated': 'marked a revision fabricated',
  'phaseMap.upload': 'uploaded a phase map',
  'fabRun.record': 'recorded a fab run',
  'team.invite': 'changed an invitation',
  'team.changeRole': 'changed a role',
  'team.join': 'joined the team',
};

export function activityWords(action: string, details: Record<string, unknown>): string {
  if (action === 'team.invite') return details.revoked ? 'revoked an invitation' : 'invited someone';
  return ACTIVITY_WORDS[action] ?? action;
}
