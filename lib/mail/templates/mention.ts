import { revisionTitle, revisionUrl, settingsUrl, type RevisionMailContext } from './context';
import { renderEmail, type RenderedEmail } from './message';

/** To a team member mentioned in a comment. */
export function mentionEmail(ctx: RevisionMailContext & { commentId: string; body: string; anchor: string | null }): RenderedEmail {
  const title = revisionTitle(ctx);
  return renderEmail({
    subject: `${ctx.actorName} mentioned you on ${title}`,
    headline: `${ctx.actorName} mentioned you in a comment on ${title}${ctx.anchor ? ` (${ctx.anchor})` : ''}.`,
    paragraphs: [],
    quote: ctx.body,
    link: { label: 'Open the comment', url: revisionUrl(ctx, `comment-${ctx.commentId}`) },
    settingsUrl: settingsUrl(ctx),
    reason: `you were mentioned in ${ctx.teamName}`,
  });
}
