// Reads the link out of a message the server sent to the SMTP fake, as the path to open on the
// test server (mail links carry PUBLIC_URL, which is not where the test server listens).
import type { MailFake } from '../../../api/mail/mail-fake';

const WAIT_MS = 10_000;

export async function mailedLink(
  mail: MailFake,
  to: string,
  pathStart: string,
  after = 0,
): Promise<string> {
  const deadline = Date.now() + WAIT_MS;
  for (;;) {
    const message = mail.messages.slice(after).find((m) => m.to.includes(to) && m.text.includes(pathStart));
    const url = message?.text.match(/https?:\/\/\S+/g)?.find((u) => new URL(u).pathname === pathStart);
    if (url) {
      const { pathname, search } = new URL(url);
      return `${pathname}${search}`;
    }
    if (Date.now() > deadline) {
      const seen = mail.messages.map((m) => `${m.to.join(',')}: ${m.subject}`).join('; ') || 'none';
      throw new Error(`no mail to ${to} with a link to ${pathStart} within ${WAIT_MS} ms (messages: ${seen})`);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
