import type { CaughtMail } from '../../../scripts/setup/mail-catcher';

/** Messages the SMTP catcher of `npm test` holds for `recipient`. */
export async function caughtMailTo(recipient: string): Promise<CaughtMail[]> {
  const url = process.env.MAIL_CATCHER_URL;
  if (!url) throw new Error('No SMTP catcher: run the tests with `npm test`, which starts one.');
  const all = (await (await fetch(`${url}/messages`)).json()) as CaughtMail[];
  return all.filter((mail) => mail.to.includes(recipient));
}

/** Waits until the catcher holds a message for `recipient` (calling `nudge`, e.g. an outbox sweep, between looks). */
export async function waitForMailTo(recipient: string, nudge: () => Promise<unknown> = async () => undefined, timeoutMs = 15_000): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    await nudge();
    const [mail] = await caughtMailTo(recipient);
    if (mail) return mail;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`No e-mail to ${recipient} reached the SMTP catcher within ${timeoutMs} ms.`);
}
