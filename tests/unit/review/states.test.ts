import { describe, expect, it } from 'vitest';
import { MOVE_RULES, REVISION_MOVES, REVISION_STATES, STATE_LABELS, movesFrom, planMove } from '@/lib/workflow/states';

// The transition table as written in the team's authorization brief (docs, not our code):
// draft → in_review (requestReview); in_review → approved (approve) or changes_requested (requestChanges);
// changes_requested → in_review (requestReview); approved → released (release); released → fabricated (markFabricated).
const EXPECTED: Array<[string, string, string]> = [
  ['draft', 'requestReview', 'in_review'],
  ['in_review', 'approve', 'approved'],
  ['in_review', 'requestChanges', 'changes_requested'],
  ['changes_requested', 'requestReview', 'in_review'],
  ['approved', 'release', 'released'],
  ['released', 'markFabricated', 'fabricated'],
];

describe('revision state machine', () => {
  it('allows exactly the transitions of the table, for every state × move pair', () => {
    for (const state of REVISION_STATES) {
      for (const move of REVISION_MOVES) {
        const expected = EXPECTED.find(([from, m]) => from === state && m === move);
        const plan = planMove(state, move);
        if (expected) {
          expect(plan, `${state} + ${move}`).toEqual({ ok: true, from: state, to: expected[2], permission: MOVE_RULES[move].permission });
        } else {
          expect(plan.ok, `${state} + ${move}`).toBe(false);
        }
      }
    }
  });

  it('explains a refused move in words users see', () => {
    const plan = planMove('approved', 'requestReview');
    expect(plan.ok).toBe(false);
    if (!plan.ok) {
      expect(plan.message).toContain('"Request review"');
      expect(plan.message).toContain('approved');
      expect(plan.message).toContain('"draft" or "changes requested"');
    }
  });

  it('fabricated is terminal and draft is reachable from nowhere', () => {
    expect(movesFrom('fabricated')).toEqual([]);
    expect(Object.values(MOVE_RULES).some((r) => r.to === 'draft')).toBe(false);
  });

  it('names each permission after its move and labels every state as the brief does', () => {
    for (const move of REVISION_MOVES) expect(MOVE_RULES[move].permission).toBe(`revision.${move}`);
    expect(STATE_LABELS).toEqual({
      draft: 'draft',
      in_review: 'in review',
      approved: 'approved',
      changes_requested: 'changes requested',
      released: 'released to fab',
      fabricated: 'fabricated',
    });
  });
});
