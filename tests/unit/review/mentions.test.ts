import { describe, expect, it } from 'vitest';
import { mentionHandle, parseMentions, resolveMentions } from '@/lib/workflow/mentions';

describe('parseMentions', () => {
  it('finds handles at the start, after spaces and punctuation, once each, lower-cased', () => {
    expect(parseMentions('@Reviewer please check zone 12, (cc @fab) and @reviewer again.')).toEqual(['reviewer', 'fab']);
  });

  it('ignores e-mail addresses and a bare @', () => {
    expect(parseMentions('write to owner@example.com or @ nobody')).toEqual([]);
  });

  it('keeps dots, dashes and underscores inside a handle but not at its end', () => {
    expect(parseMentions('@ana.lee- and @j_smith.')).toEqual(['ana.lee', 'j_smith']);
  });
});

describe('resolveMentions', () => {
  const members = [
    { userId: 'u1', email: 'reviewer@example.com' },
    { userId: 'u2', email: 'Fab@Example.com' },
    { userId: 'u3', email: 'fab@other.example' },
  ];

  it('matches the part of the address before the @, ignoring case, and reports unknown handles', () => {
    const { members: found, unknown } = resolveMentions('@REVIEWER and @fab and @ghost', members);
    expect(found.map((m) => m.userId)).toEqual(['u1', 'u2', 'u3']);
    expect(unknown).toEqual(['ghost']);
  });

  it('derives the handle from the address', () => {
    expect(mentionHandle('Owner@Example.com')).toBe('owner');
  });
});
