import { revisionTitle, revisionUrl, settingsUrl, type RevisionMailContext } from './context';
import { renderEmail, type RenderedEmail } from './message';

/** To the team's fab staff when a revision is released for fabrication. */
export function releasedToFabEmail(ctx: RevisionMailContext & { bundleSha256?: string | null }): RenderedEmail {
  const title = revisionTitle(ctx);
  return renderEmail({
    subject: `Released to fab: ${title}`,
    headline: `${ctx.actorName} released ${title} to fab.`,
    paragraphs: [
      ctx.bundleSha256 ? `Bundle SHA-256: ${ctx.bundleSha256}` : 'The bundle is on the revision page.',
      'Check the layer map, tone and process minimum in the bundle before exposure, and follow your lab\'s safety rules for resists, developers and focused light.',
    ],
    link: { label: 'Open the revision and download the bundle', url: revisionUrl(ctx) },
    settingsUrl: settingsUrl(ctx),
    reason: `you are fab staff in ${ctx.teamName}`,
  });
}
