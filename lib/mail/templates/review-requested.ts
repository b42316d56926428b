import { revisionTitle, revisionUrl, settingsUrl, type RevisionMailContext } from './context';
import { renderEmail, type RenderedEmail } from './message';

/** To the team's reviewers when a designer asks for review. */
export function reviewRequestedEmail(ctx: RevisionMailContext & { message: string }): RenderedEmail {
  const title = revisionTitle(ctx);
  return renderEmail({
    subject: `Review requested: ${title}`,
    headline: `${ctx.actorName} asks you to review ${title}.`,
    paragraphs: ['Compare it with the previous revision, then approve it or request changes.'],
    quote: ctx.message || undefined,
    link: { label: 'Open the revision', url: revisionUrl(ctx) },
    settingsUrl: settingsUrl(ctx),
    reason: `you review designs in ${ctx.teamName}`,
  });
}
