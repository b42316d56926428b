/** The two e-mails of signing in: a one-time sign-in link and a team invitation. */
import { escapeHtml } from './templates/escape-html';

export interface AccountEmail {
  subject: string;
  text: string;
  html: string;
}

function render(subject: string, lines: string[], link: { label: string; url: string }, footer: string): AccountEmail {
  const text = [...lines, `${link.label}: ${link.url}`, `-- \n${footer}`].join('\n\n');
  const html = [
    '<!doctype html><html><body style="margin:0;padding:24px;background:#f7f7f2;color:#14213d;font-family:system-ui,sans-serif;font-size:14px;line-height:20px">',
    ...lines.map((line) => `<p style="margin:0 0 12px">${escapeHtml(line)}</p>`),
    `<p style="margin:0 0 12px"><a href="${escapeHtml(link.url)}" style="color:#5b3fd1">${escapeHtml(link.label)}</a></p>`,
    `<p style="margin:12px 0 0;font-size:12px">${escapeHtml(footer)}</p>`,
    '</body></html>',
  ].join('');
  return { subject, text, html };
}

export function signInLinkEmail(url: string, minutesValid: number): AccountEmail {
  return render(
    'Your Zonewright sign-in link',
    ['Someone, hopefully you, asked to sign in to Zonewright with this address.', `The link works once, within ${minutesValid} minutes.`],
    { label: 'Sign in', url },
    'If you did not ask for it, ignore this e-mail; nothing changes.',
  );
}

export function invitationEmail(input: { url: string; teamName: string; inviterName: string; roleLabel: string; daysValid: number }): AccountEmail {
  return render(
    `${input.inviterName} invited you to ${input.teamName} on Zonewright`,
    [
      `${input.inviterName} invited you to join ${input.teamName} as ${input.roleLabel.toLowerCase()}.`,
      `The invitation is valid for ${input.daysValid} days.`,
    ],
    { label: 'Accept the invitation', url: input.url },
    'If you did not expect it, ignore this e-mail; no account is made until you accept.',
  );
}
