import { describe, expect, it } from 'vitest';
import { createSmtpMailer } from './mailer';
import { extractLinks, startFakeSmtp } from './fake-smtp';

describe('extractLinks', () => {
  it('finds each http(s) link once, without trailing punctuation of the sentence', () => {
    const text =
      'Open http://127.0.0.1:5810/invite/abc_D-1 now (or https://pitwall.example/reset?token=x1).\n' +
      'Again: http://127.0.0.1:5810/invite/abc_D-1. Done.';
    expect(extractLinks(text)).toEqual(['http://127.0.0.1:5810/invite/abc_D-1', 'https://pitwall.example/reset?token=x1']);
  });
});

describe('startFakeSmtp', () => {
  it('receives a mail sent over real SMTP with nodemailer and lists it newest first', async () => {
    const smtp = await startFakeSmtp(0);
    try {
      const mailer = createSmtpMailer({ host: '127.0.0.1', port: smtp.port, secure: false, from: 'Pitwall <p@localhost>', ignoreTls: true });
      const arrived = smtp.inbox.waitFor('Priya@Harborlight.example');
      await mailer.send({ to: 'priya@harborlight.example', subject: 'First', text: 'see http://a.example/1' });
      await mailer.send({ to: 'priya@harborlight.example', subject: 'Second', text: 'none' });
      expect((await arrived).subject).toBe('First');
      expect(smtp.inbox.list().map((m) => m.subject)).toEqual(['Second', 'First']);
      expect(smtp.inbox.list()[1]!.links).toEqual(['http://a.example/1']);
    } finally {
      await smtp.close();
    }
  });
});
