import { describe, expect, it } from 'vitest';
import { buildThreads } from '@/lib/workflow/comment-tree';
import { splitMentions } from '@/lib/workflow/mentions';

const c = (id: string, parentId: string | null, minute: number) => ({ id, parentId, createdAt: `2026-12-01T10:${String(minute).padStart(2, '0')}:00.000Z` });

describe('buildThreads', () => {
  it('nests replies under their parents, oldest first at every level', () => {
    const threads = buildThreads([c('b', null, 5), c('a', null, 1), c('a2', 'a', 9), c('a1', 'a', 3), c('a1x', 'a1', 4)]);
    const shape = (nodes: ReturnType<typeof buildThreads>): unknown => nodes.map((n) => [n.comment.id, shape(n.replies)]);
    expect(shape(threads)).toEqual([
      ['a', [['a1', [['a1x', []]]], ['a2', []]]],
      ['b', []],
    ]);
  });

  it('shows a reply whose parent is missing as its own thread', () => {
    expect(buildThreads([c('r', 'gone', 1)]).map((n) => n.comment.id)).toEqual(['r']);
  });
});

describe('splitMentions', () => {
  it('cuts text into plain runs and mentions, keeping every character', () => {
    const text = 'Ask @Fab, not fab@example.com, about @reviewer.';
    const parts = splitMentions(text);
    expect(parts).toEqual([
      { text: 'Ask ' },
      { text: '@Fab', mention: 'fab' },
      { text: ', not fab@example.com, about ' },
      { text: '@reviewer', mention: 'reviewer' },
      { text: '.' },
    ]);
    expect(parts.map((p) => p.text).join('')).toBe(text);
  });
});
