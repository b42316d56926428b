import { describe, expect, it } from 'vitest';
import type { TeamRole } from '@/lib/auth/roles';
import { allowedMoves } from '@/lib/workflow/allowed-moves';
import { moveNotification, type MemberContact } from '@/lib/workflow/notifications';

function member(userId: string, role: TeamRole, off: Partial<MemberContact> = {}): MemberContact {
  return {
    userId,
    role,
    email: `${userId}@example.com`,
    name: userId,
    notifyReviewRequested: true,
    notifyReviewOutcome: true,
    notifyReleased: true,
    notifyMention: true,
    ...off,
  };
}

const team = [member('olga', 'owner'), member('dana', 'designer'), member('rui', 'reviewer'), member('rita', 'reviewer', { notifyReviewRequested: false }), member('fay', 'fab'), member('vic', 'viewer')];
const ids = (n: ReturnType<typeof moveNotification>) => n?.recipients.map((m) => m.userId);

describe('moveNotification', () => {
  it('sends a review request to the reviewers who want it', () => {
    expect(moveNotification('requestReview', { actorId: 'dana', authorId: 'dana', members: team })).toMatchObject({ kind: 'review-requested' });
    expect(ids(moveNotification('requestReview', { actorId: 'dana', authorId: 'dana', members: team }))).toEqual(['rui']);
  });

  it('falls back to the owners when the team has no reviewer', () => {
    const noReviewers = team.filter((m) => m.role !== 'reviewer');
    expect(ids(moveNotification('requestReview', { actorId: 'dana', authorId: 'dana', members: noReviewers }))).toEqual(['olga']);
  });

  it('tells the author about approval and requested changes, unless they turned it off or acted themselves', () => {
    expect(ids(moveNotification('approve', { actorId: 'rui', authorId: 'dana', members: team }))).toEqual(['dana']);
    expect(ids(moveNotification('requestChanges', { actorId: 'rui', authorId: 'dana', members: team }))).toEqual(['dana']);
    const quiet = team.map((m) => (m.userId === 'dana' ? { ...m, notifyReviewOutcome: false } : m));
    expect(ids(moveNotification('approve', { actorId: 'rui', authorId: 'dana', members: quiet }))).toEqual([]);
    expect(ids(moveNotification('approve', { actorId: 'olga', authorId: 'olga', members: team }))).toEqual([]);
  });

  it('tells fab staff about a release and nobody about fabrication', () => {
    expect(ids(moveNotification('release', { actorId: 'rui', authorId: 'dana', members: team }))).toEqual(['fay']);
    expect(moveNotification('markFabricated', { actorId: 'fay', authorId: 'dana', members: team })).toBeNull();
  });
});

describe('allowedMoves', () => {
  it('offers a reviewer approval of someone else\'s revision but not of their own', () => {
    expect(allowedMoves('in_review', { userId: 'rui', role: 'reviewer' }, 'dana')).toEqual(['approve', 'requestChanges']);
    expect(allowedMoves('in_review', { userId: 'rui', role: 'reviewer' }, 'rui')).toEqual([]);
  });

  it('offers nothing to viewers and non-members', () => {
    expect(allowedMoves('draft', { userId: 'vic', role: 'viewer' }, 'dana')).toEqual([]);
    expect(allowedMoves('draft', { userId: 'x', role: null }, 'dana')).toEqual([]);
  });
});
