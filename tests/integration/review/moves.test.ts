/**
 * Every review move by every role against the real PostgreSQL, through applyMove (the path the
 * moves route and the fab-run recording share). Expected outcomes are written out from the team's
 * authorization table and state diagram, not computed from our own modules.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '@/db';
import { applyMove } from '@/db/queries/review';
import { APP_URL, auditFor, mailTo, makeRevision, makeTeam, setPreference, stateOf, type TestTeam } from './fixtures';

type Role = 'owner' | 'designer' | 'reviewer' | 'fab' | 'viewer';
type Move = 'requestReview' | 'approve' | 'requestChanges' | 'release' | 'markFabricated';
type State = 'draft' | 'in_review' | 'changes_requested' | 'approved' | 'released' | 'fabricated';

// From the authorization table: who may make each move.
const MAY: Record<Move, Role[]> = {
  requestReview: ['owner', 'designer'],
  approve: ['owner', 'reviewer'],
  requestChanges: ['owner', 'reviewer'],
  release: ['owner', 'reviewer'],
  markFabricated: ['owner', 'fab'],
};
// From the state diagram: where each move starts and leads.
const FROM: Record<Move, State[]> = {
  requestReview: ['draft', 'changes_requested'],
  approve: ['in_review'],
  requestChanges: ['in_review'],
  release: ['approved'],
  markFabricated: ['released'],
};
const TO: Record<Move, State> = {
  requestReview: 'in_review',
  approve: 'approved',
  requestChanges: 'changes_requested',
  release: 'released',
  markFabricated: 'fabricated',
};
const ROLES: Role[] = ['owner', 'designer', 'reviewer', 'fab', 'viewer'];
const STATES: State[] = ['draft', 'in_review', 'changes_requested', 'approved', 'released', 'fabricated'];
const MOVES = Object.keys(MAY) as Move[];

let team: TestTeam;
beforeAll(async () => {
  team = await makeTeam();
});
afterAll(closeDb);

describe('every move by every role from each state it starts from', () => {
  for (const move of MOVES) {
    for (const from of FROM[move]) {
      for (const role of ROLES) {
        const allowed = MAY[move].includes(role);
        it(`${role} ${allowed ? 'may' : 'may not'} ${move} from ${from}`, async () => {
          const revisionId = await makeRevision(team, { state: from });
          const outcome = await applyMove({ revisionId, actorId: team.members[role].id, move, expectedState: from, appUrl: APP_URL });
          const audit = await auditFor(revisionId);
          if (allowed) {
            expect(outcome).toMatchObject({ ok: true, from, to: TO[move] });
            expect(await stateOf(revisionId)).toBe(TO[move]);
            expect(audit).toHaveLength(1);
            expect(audit[0]).toMatchObject({ actorId: team.members[role].id, teamId: team.id, action: `revision.${move}` });
            expect(audit[0].details).toMatchObject({ move, from, to: TO[move] });
          } else {
            expect(outcome).toMatchObject({ ok: false, status: 403 });
            expect(await stateOf(revisionId)).toBe(from);
            expect(audit).toHaveLength(0);
          }
        });
      }
    }
  }
});

describe('moves from a state they do not start from', () => {
  for (const move of MOVES) {
    for (const from of STATES.filter((s) => !FROM[move].includes(s))) {
      it(`owner's ${move} from ${from} is refused with 409 and changes nothing`, async () => {
        const revisionId = await makeRevision(team, { state: from });
        const outcome = await applyMove({ revisionId, actorId: team.members.owner.id, move, expectedState: from, appUrl: APP_URL });
        expect(outcome).toMatchObject({ ok: false, status: 409 });
        if (!outcome.ok) expect(outcome.message).toMatch(/not possible.*Nothing was changed/);
        expect(await stateOf(revisionId)).toBe(from);
        expect(await auditFor(revisionId)).toHaveLength(0);
      });
    }
  }
});

describe('special cases', () => {
  it('a reviewer may not approve or request changes on a revision they wrote; another reviewer may', async () => {
    const revisionId = await makeRevision(team, { state: 'in_review', authorId: team.members.reviewer.id });
    for (const move of ['approve', 'requestChanges'] as const) {
      const own = await applyMove({ revisionId, actorId: team.members.reviewer.id, move, expectedState: 'in_review', appUrl: APP_URL });
      expect(own).toMatchObject({ ok: false, status: 403 });
      if (!own.ok) expect(own.message).toMatch(/You wrote this revision/);
    }
    const other = await applyMove({ revisionId, actorId: team.members.reviewer2.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL });
    expect(other).toMatchObject({ ok: true, to: 'approved' });
  });

  it('an owner may approve their own revision', async () => {
    const revisionId = await makeRevision(team, { state: 'in_review', authorId: team.members.owner.id });
    expect(await applyMove({ revisionId, actorId: team.members.owner.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL })).toMatchObject({ ok: true });
  });

  it('a stale page (state changed since it loaded) gets 409 and changes nothing', async () => {
    const revisionId = await makeRevision(team, { state: 'approved' });
    const outcome = await applyMove({ revisionId, actorId: team.members.reviewer.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL });
    expect(outcome).toMatchObject({ ok: false, status: 409 });
    if (!outcome.ok) expect(outcome.message).toMatch(/changed since the page was loaded: it is now approved/);
    expect(await stateOf(revisionId)).toBe('approved');
    expect(await auditFor(revisionId)).toHaveLength(0);
  });

  it('two reviewers deciding at once: exactly one wins, the other gets 409', async () => {
    const revisionId = await makeRevision(team, { state: 'in_review' });
    const [a, b] = await Promise.all([
      applyMove({ revisionId, actorId: team.members.reviewer.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL }),
      applyMove({ revisionId, actorId: team.members.reviewer2.id, move: 'requestChanges', expectedState: 'in_review', appUrl: APP_URL }),
    ]);
    expect([a.ok, b.ok].filter(Boolean)).toHaveLength(1);
    expect([a, b].find((o) => !o.ok)).toMatchObject({ status: 409 });
    expect(await auditFor(revisionId)).toHaveLength(1);
  });

  it('review cannot be requested before the bundle is ready', async () => {
    const revisionId = await makeRevision(team, { state: 'draft', buildStatus: 'running' });
    const outcome = await applyMove({ revisionId, actorId: team.members.designer.id, move: 'requestReview', expectedState: 'draft', appUrl: APP_URL });
    expect(outcome).toMatchObject({ ok: false, status: 409 });
    if (!outcome.ok) expect(outcome.message).toMatch(/not ready/);
  });

  it('non-members and unknown revisions get 404', async () => {
    const revisionId = await makeRevision(team, { state: 'draft' });
    const base = { move: 'requestReview' as const, expectedState: 'draft' as const, appUrl: APP_URL };
    expect(await applyMove({ ...base, revisionId, actorId: team.outsider.id })).toMatchObject({ ok: false, status: 404 });
    expect(await applyMove({ ...base, revisionId: '00000000-0000-4000-8000-000000000000', actorId: team.members.owner.id })).toMatchObject({ ok: false, status: 404 });
  });
});

describe('e-mails after moves, through the local SMTP fake', () => {
  it('review requested reaches the reviewers who want it, approval reaches the author, release reaches fab staff', async () => {
    await setPreference(team.members.reviewer2.id, { notifyReviewRequested: false });
    const revisionId = await makeRevision(team, { state: 'draft' });
    const requested = await applyMove({ revisionId, actorId: team.members.designer.id, move: 'requestReview', expectedState: 'draft', appUrl: APP_URL });
    expect(requested).toMatchObject({ ok: true, notifications: [{ kind: 'review-requested', to: team.members.reviewer.email, sent: true }] });

    const reviewerMail = await mailTo(team.members.reviewer.email);
    const request = reviewerMail.find((m) => m.subject.startsWith('Review requested') && m.text.includes(revisionId));
    expect(request?.text).toContain(`${APP_URL}/revisions/${revisionId}`);
    expect(request?.html).toContain(`href="${APP_URL}/revisions/${revisionId}"`);
    expect((await mailTo(team.members.reviewer2.email)).filter((m) => m.text.includes(revisionId))).toHaveLength(0);

    await applyMove({ revisionId, actorId: team.members.reviewer.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL });
    expect((await mailTo(team.members.designer.email)).some((m) => m.subject.startsWith('Approved') && m.text.includes(revisionId))).toBe(true);

    await applyMove({ revisionId, actorId: team.members.reviewer.id, move: 'release', expectedState: 'approved', appUrl: APP_URL });
    const fabMail = (await mailTo(team.members.fab.email)).find((m) => m.subject.startsWith('Released to fab') && m.text.includes(revisionId));
    expect(fabMail?.text).toContain('ab'.repeat(32));
    await setPreference(team.members.reviewer2.id, { notifyReviewRequested: true });
  });

  it('requested changes reach the author with the reviewer\'s note, unless the author turned them off', async () => {
    const revisionId = await makeRevision(team, { state: 'in_review' });
    const note = 'Zone 212 is narrower than the 1 µm process minimum.';
    await applyMove({ revisionId, actorId: team.members.reviewer.id, move: 'requestChanges', expectedState: 'in_review', note, appUrl: APP_URL });
    const mail = (await mailTo(team.members.designer.email)).find((m) => m.subject.startsWith('Changes requested') && m.text.includes(revisionId));
    expect(mail?.text).toContain(`> ${note}`);
    const audit = await auditFor(revisionId);
    expect(audit[0].details).toMatchObject({ note });

    await setPreference(team.members.designer.id, { notifyReviewOutcome: false });
    const second = await makeRevision(team, { state: 'in_review' });
    const outcome = await applyMove({ revisionId: second, actorId: team.members.reviewer.id, move: 'approve', expectedState: 'in_review', appUrl: APP_URL });
    expect(outcome).toMatchObject({ ok: true, notifications: [] });
    expect((await mailTo(team.members.designer.email)).some((m) => m.text.includes(second))).toBe(false);
    await setPreference(team.members.designer.id, { notifyReviewOutcome: true });
  });
});
