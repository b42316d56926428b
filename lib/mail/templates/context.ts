/** What every review e-mail needs to know about the revision it concerns. */
export interface RevisionMailContext {
  /** the app's public address, e.g. http://127.0.0.1:3000 (no trailing slash) */
  appUrl: string;
  teamName: string;
  designName: string;
  revisionId: string;
  revisionNumber: number;
  /** who made the move or wrote the comment */
  actorName: string;
}

export function revisionTitle(ctx: RevisionMailContext): string {
  return `revision ${ctx.revisionNumber} of ${ctx.designName}`;
}

export function revisionUrl(ctx: RevisionMailContext, fragment?: string): string {
  return `${ctx.appUrl}/revisions/${encodeURIComponent(ctx.revisionId)}${fragment ? `#${fragment}` : ''}`;
}

export function settingsUrl(ctx: RevisionMailContext): string {
  return `${ctx.appUrl}/settings`;
}
