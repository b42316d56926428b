import { describe, expect, it } from 'vitest';
import { createCommentSchema, editCommentSchema } from '@/lib/schemas/comments';
import { compareQuerySchema, moveRequestSchema } from '@/lib/schemas/review';

const id = '3f2b8c1e-8d4a-4c9e-9a51-0c6d2f1e7b10';

describe('review payloads', () => {
  it('accepts a known move with the expected state and refuses unknown ones with the choices listed', () => {
    expect(moveRequestSchema.parse({ move: 'approve', expectedState: 'in_review' })).toEqual({ move: 'approve', expectedState: 'in_review' });
    const bad = moveRequestSchema.safeParse({ move: 'ship', expectedState: 'in_review' });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].message).toContain('requestReview');
  });

  it('compares two different revisions only', () => {
    expect(compareQuerySchema.safeParse({ a: id, b: id }).error?.issues[0].message).toBe('Pick two different revisions to compare.');
    expect(compareQuerySchema.safeParse({ a: 'x', b: id }).success).toBe(false);
  });
});

describe('comment payloads', () => {
  it('takes a line anchor or a mask point, not both and not neither half of a point', () => {
    expect(createCommentSchema.parse({ body: ' looks fine ', anchor: { line: 4 } })).toEqual({ body: 'looks fine', anchor: { line: 4 } });
    expect(createCommentSchema.parse({ body: 'x', anchor: { x_um: -12.5, y_um: 30 } }).anchor).toEqual({ x_um: -12.5, y_um: 30 });
    expect(createCommentSchema.safeParse({ body: 'x', anchor: { line: 4, x_um: 1, y_um: 2 } }).success).toBe(false);
    expect(createCommentSchema.safeParse({ body: 'x', anchor: { x_um: 1 } }).success).toBe(false);
    expect(createCommentSchema.safeParse({ body: 'x', anchor: { line: 0 } }).success).toBe(false);
    expect(createCommentSchema.safeParse({ body: 'x', anchor: { x_um: Infinity, y_um: 0 } }).success).toBe(false);
  });

  it('refuses empty and over-long bodies with a plain message', () => {
    expect(createCommentSchema.safeParse({ body: '   ' }).error?.issues[0].message).toBe('Write something first.');
    expect(editCommentSchema.safeParse({ body: 'a'.repeat(10_001) }).error?.issues[0].message).toMatch(/at most 10000/);
  });
});
