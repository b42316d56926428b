import type { Action } from './permissions';

/** What each action is called in messages ("Your role does not allow you to …"). */
export const ACTION_LABELS: Record<Action, string> = {
  'design.view': 'view designs',
  'design.create': 'create a design',
  'design.edit': 'edit a design',
  'revision.view': 'view revisions',
  'revision.download': 'download a revision',
  'revision.save': 'save a revision',
  'revision.requestReview': 'ask for a review',
  'revision.approve': 'approve a revision',
  'revision.requestChanges': 'request changes',
  'revision.release': 'release a revision to fab',
  'revision.markFabricated': 'mark a revision fabricated',
  'phaseMap.upload': 'upload a phase map',
  'fabRun.record': 'record a fab run',
  'comment.view': 'read comments',
  'comment.create': 'comment',
  'comment.edit': 'edit this comment',
  'comment.delete': 'delete this comment',
  'team.view': 'see the team',
  'team.invite': 'invite people',
  'team.changeRole': 'change roles',
  'mailbox.view': 'open the mailbox',
};
