import { revisionTitle, revisionUrl, settingsUrl, type RevisionMailContext } from './context';
import { renderEmail, type RenderedEmail } from './message';

/** To the revision's author when a reviewer approves it or requests changes. */
export function reviewOutcomeEmail(ctx: RevisionMailContext & { outcome: 'approved' | 'changes_requested'; note?: string }): RenderedEmail {
  const title = revisionTitle(ctx);
  const approved = ctx.outcome === 'approved';
  return renderEmail({
    subject: approved ? `Approved: ${title}` : `Changes requested: ${title}`,
    headline: approved ? `${ctx.actorName} approved ${title}.` : `${ctx.actorName} requested changes to ${title}.`,
    paragraphs: [approved ? 'It can now be released to fab.' : 'Read the comments, save a new revision and request review again.'],
    quote: ctx.note || undefined,
    link: { label: approved ? 'Open the revision' : 'Open the revision and its comments', url: revisionUrl(ctx) },
    settingsUrl: settingsUrl(ctx),
    reason: `you wrote this revision in ${ctx.teamName}`,
  });
}
