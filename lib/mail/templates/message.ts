import { escapeHtml } from './escape-html';

export interface RenderedEmail {
  subject: string;
  text: string;
  html: string;
}

export interface EmailContent {
  subject: string;
  /** first line, e.g. "Revision 3 of Bifocal test lens is ready for review." */
  headline: string;
  /** further paragraphs of plain text */
  paragraphs: string[];
  /** optional quoted text (a review note or a comment), shown set off */
  quote?: string;
  link: { label: string; url: string };
  /** where the recipient turns this kind of e-mail off */
  settingsUrl: string;
  /** why the recipient gets it, e.g. "you are a reviewer in Optics Lab" */
  reason: string;
}

/** One plain-text and one HTML rendering of the same message, both carrying the link back. */
export function renderEmail(content: EmailContent): RenderedEmail {
  const quoted = content.quote ? content.quote.split('\n').map((line) => `> ${line}`).join('\n') : null;
  const text = [
    content.headline,
    ...content.paragraphs,
    ...(quoted ? [quoted] : []),
    `${content.link.label}: ${content.link.url}`,
    `-- \nZonewright. You get this because ${content.reason}. Turn this kind of e-mail off in Settings: ${content.settingsUrl}`,
  ].join('\n\n');

  const p = (inner: string) => `<p style="margin:0 0 12px">${inner}</p>`;
  const html = [
    '<!doctype html><html><body style="margin:0;padding:24px;background:#f7f7f2;color:#14213d;font-family:\'IBM Plex Sans\',system-ui,sans-serif;font-size:14px;line-height:20px">',
    '<div style="max-width:560px;border:1px solid #d9d6cc;border-radius:6px;padding:16px;background:#ffffff">',
    p(`<strong>${escapeHtml(content.headline)}</strong>`),
    ...content.paragraphs.map((para) => p(escapeHtml(para))),
    content.quote
      ? `<blockquote style="margin:0 0 12px;padding:8px 12px;border-left:2px solid #d9d6cc;white-space:pre-wrap">${escapeHtml(content.quote)}</blockquote>`
      : '',
    p(`<a href="${escapeHtml(content.link.url)}" style="color:#5b3fd1">${escapeHtml(content.link.label)}</a>`),
    '</div>',
    `<p style="margin:12px 0 0;font-size:12px;color:#14213d">Zonewright. You get this because ${escapeHtml(content.reason)}. <a href="${escapeHtml(content.settingsUrl)}" style="color:#14213d">Turn this kind of e-mail off in Settings</a>.</p>`,
    '</body></html>',
  ].join('');
  return { subject: content.subject, text, html };
}
