import { describe, expect, it } from 'vitest';
import { ACTIONS, can, type Action } from '@/lib/auth/permissions';
import { TEAM_ROLES, type TeamRole } from '@/lib/auth/roles';

// The expected table, written out by hand from the product's authorization rules (issue 2 and the
// team brief), one row per action: which roles may act on a resource someone else authored, and on
// their own. o = owner, d = designer, r = reviewer, f = fab, v = viewer.
const TABLE: Record<Action, { others: string; own: string }> = {
  'design.view': { others: 'odrfv', own: 'odrfv' },
  'revision.view': { others: 'odrfv', own: 'odrfv' },
  'revision.download': { others: 'odrfv', own: 'odrfv' },
  'comment.view': { others: 'odrfv', own: 'odrfv' },
  'team.view': { others: 'odrfv', own: 'odrfv' },
  'design.create': { others: 'od', own: 'od' },
  'design.edit': { others: 'od', own: 'od' },
  'revision.save': { others: 'od', own: 'od' },
  'phaseMap.upload': { others: 'od', own: 'od' },
  'revision.requestReview': { others: 'od', own: 'od' },
  'revision.approve': { others: 'or', own: 'o' },
  'revision.requestChanges': { others: 'or', own: 'o' },
  'revision.release': { others: 'or', own: 'or' },
  'revision.markFabricated': { others: 'of', own: 'of' },
  'fabRun.record': { others: 'of', own: 'of' },
  'comment.create': { others: 'odrf', own: 'odrf' },
  'comment.edit': { others: '', own: 'odrfv' },
  'comment.delete': { others: 'o', own: 'odrfv' },
  'team.invite': { others: 'o', own: 'o' },
  'team.changeRole': { others: 'o', own: 'o' },
  'mailbox.view': { others: 'odrfv', own: 'odrfv' },
};

const LETTER: Record<TeamRole, string> = { owner: 'o', designer: 'd', reviewer: 'r', fab: 'f', viewer: 'v' };
const ME = 'user-me';
const SOMEONE_ELSE = 'user-other';

describe('can: the full role × action table', () => {
  it('covers every action', () => {
    expect(Object.keys(TABLE).sort()).toEqual([...ACTIONS].sort());
  });

  for (const action of ACTIONS) {
    for (const role of TEAM_ROLES) {
      const { others, own } = TABLE[action];
      it(`${role} ${others.includes(LETTER[role]) ? 'may' : 'may not'} ${action} on someone else's`, () => {
        const resource = { authorId: SOMEONE_ELSE, localRun: true };
        expect(can({ userId: ME, role }, action, resource)).toBe(others.includes(LETTER[role]));
      });
      it(`${role} ${own.includes(LETTER[role]) ? 'may' : 'may not'} ${action} on their own`, () => {
        const resource = { authorId: ME, localRun: true };
        expect(can({ userId: ME, role }, action, resource)).toBe(own.includes(LETTER[role]));
      });
    }
  }
});

describe('can: outside a team', () => {
  it('denies a non-member every team action', () => {
    for (const action of ACTIONS.filter((a) => a !== 'mailbox.view')) {
      expect(can({ userId: ME, role: null }, action, { authorId: ME }), action).toBe(false);
    }
  });

  it('denies an anonymous caller everything', () => {
    for (const action of ACTIONS) expect(can(null, action, { authorId: ME, localRun: true }), action).toBe(false);
  });

  it('shows the mailbox to any signed-in user, only on a local run', () => {
    expect(can({ userId: ME, role: null }, 'mailbox.view', { localRun: true })).toBe(true);
    expect(can({ userId: ME, role: 'owner' }, 'mailbox.view', { localRun: false })).toBe(false);
    expect(can({ userId: ME, role: 'owner' }, 'mailbox.view')).toBe(false);
  });

  it('denies author-dependent actions to non-owners when the author is not given', () => {
    expect(can({ userId: ME, role: 'reviewer' }, 'revision.approve')).toBe(false);
    expect(can({ userId: ME, role: 'designer' }, 'comment.edit')).toBe(false);
    expect(can({ userId: ME, role: 'owner' }, 'revision.approve')).toBe(true);
    expect(can({ userId: ME, role: 'owner' }, 'comment.delete')).toBe(true);
  });
});
