import { describe, expect, it } from 'vitest';
import { mentionEmail, releasedToFabEmail, reviewOutcomeEmail, reviewRequestedEmail } from '@/lib/mail/templates';

const ctx = {
  appUrl: 'http://127.0.0.1:3000',
  teamName: 'Demo optics lab',
  designName: 'Bifocal <test> lens',
  revisionId: 'rev-1',
  revisionNumber: 2,
  actorName: 'Dana',
};

describe('review e-mails', () => {
  const all = [
    reviewRequestedEmail({ ...ctx, message: 'focal length 5 mm → 6 mm' }),
    reviewOutcomeEmail({ ...ctx, outcome: 'approved' }),
    reviewOutcomeEmail({ ...ctx, outcome: 'changes_requested', note: 'zone 40 is under the minimum feature' }),
    releasedToFabEmail({ ...ctx, bundleSha256: 'ab'.repeat(32) }),
    mentionEmail({ ...ctx, commentId: 'c9', body: '@fab see line 4', anchor: 'line 4' }),
  ];

  it('carry the link back and the settings link in both the text and the HTML', () => {
    for (const mail of all) {
      expect(mail.text).toContain('http://127.0.0.1:3000/revisions/rev-1');
      expect(mail.html).toContain('href="http://127.0.0.1:3000/revisions/rev-1');
      expect(mail.text).toContain('http://127.0.0.1:3000/settings');
      expect(mail.html).toContain('href="http://127.0.0.1:3000/settings"');
      expect(mail.subject).toContain('revision 2 of Bifocal <test> lens');
    }
  });

  it('escape user text in the HTML but keep it verbatim in the plain text', () => {
    const mail = all[0];
    expect(mail.html).toContain('Bifocal &lt;test&gt; lens');
    expect(mail.html).not.toContain('<test>');
    expect(mail.text).toContain('Bifocal <test> lens');
    expect(mail.text).toContain('> focal length 5 mm → 6 mm');
  });

  it('say what happened in the subject', () => {
    expect(all.map((m) => m.subject.split(':')[0])).toEqual([
      'Review requested',
      'Approved',
      'Changes requested',
      'Released to fab',
      'Dana mentioned you on revision 2 of Bifocal <test> lens',
    ]);
    expect(all[4].text).toContain('/revisions/rev-1#comment-c9');
    expect(all[3].text).toContain('ab'.repeat(32));
  });
});
