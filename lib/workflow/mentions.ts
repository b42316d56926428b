/**
 * @mentions in comment bodies. A handle is the part of a team member's e-mail address before
 * the "@" (so "@reviewer" names reviewer@example.com); matching ignores case.
 */

// An "@" right after a letter, digit or dot belongs to an e-mail address, not a mention.
const MENTION = /(?<![\p{L}\p{N}._%+-])@([a-z0-9](?:[a-z0-9._-]*[a-z0-9])?)/giu;

/** The distinct handles mentioned in `text`, lower-cased, in order of first appearance. */
export function parseMentions(text: string): string[] {
  const seen = new Set<string>();
  for (const match of text.matchAll(MENTION)) seen.add(match[1].toLowerCase());
  return [...seen];
}

/** The handle by which a member is mentioned. */
export function mentionHandle(email: string): string {
  const at = email.lastIndexOf('@');
  return (at > 0 ? email.slice(0, at) : email).toLowerCase();
}

export interface MentionableMember {
  userId: string;
  email: string;
}

export interface ResolvedMentions<M extends MentionableMember> {
  members: M[];
  /** handles that name nobody in the team */
  unknown: string[];
}

/** Resolves the mentions in `text` to team members; every member matching a handle is included once. */
export function resolveMentions<M extends MentionableMember>(text: string, members: readonly M[]): ResolvedMentions<M> {
  const found: M[] = [];
  const unknown: string[] = [];
  for (const handle of parseMentions(text)) {
    const matches = members.filter((m) => mentionHandle(m.email) === handle);
    if (matches.length === 0) unknown.push(handle);
    for (const m of matches) if (!found.some((f) => f.userId === m.userId)) found.push(m);
  }
  return { members: found, unknown };
}

export interface TextSegment {
  text: string;
  /** the handle, when this segment is a mention ("@reviewer") */
  mention?: string;
}

/** Cuts `text` into plain runs and mentions, so a view can set mentions apart. */
export function splitMentions(text: string): TextSegment[] {
  const segments: TextSegment[] = [];
  let last = 0;
  for (const match of text.matchAll(MENTION)) {
    const at = match.index + match[0].length - match[1].length - 1;
    if (at > last) segments.push({ text: text.slice(last, at) });
    segments.push({ text: `@${match[1]}`, mention: match[1].toLowerCase() });
    last = at + match[1].length + 1;
  }
  if (last < text.length) segments.push({ text: text.slice(last) });
  return segments;
}
