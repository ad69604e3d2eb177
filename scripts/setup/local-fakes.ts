import { MailCatcher, startMailCatcher } from './mail-catcher';
import { done, step } from './step-log';
import { startStripeFake, StripeFake, stripeFakeEnv } from './stripe-fake';

/** The local stand-ins for card payments and mail, with the settings that point the server at them. */
export interface LocalFakes {
  stripe: StripeFake;
  mail: MailCatcher;
  env: Record<string, string>;
  stop(): Promise<void>;
}

const portFrom = (value: string | undefined) => (value ? Number(value) : 0);

/** Starts the Stripe fake and the SMTP catcher on loopback (free ports unless STRIPE_FAKE_PORT / SMTP_CATCHER_PORT / MAIL_CATCHER_API_PORT say otherwise). */
export async function startLocalFakes(env: NodeJS.ProcessEnv = process.env): Promise<LocalFakes> {
  step('Starting the local Stripe fake (card payments in test mode, nothing leaves this machine)');
  const stripe = await startStripeFake(portFrom(env.STRIPE_FAKE_PORT));
  done(`Stripe fake on http://127.0.0.1:${stripe.port}`);
  step('Starting the local SMTP catcher (every e-mail the app sends is kept here, none is delivered)');
  const mail = await startMailCatcher({ smtpPort: portFrom(env.SMTP_CATCHER_PORT), apiPort: portFrom(env.MAIL_CATCHER_API_PORT) });
  done(`SMTP catcher on 127.0.0.1:${mail.smtpPort}; caught messages at ${mail.apiUrl}/messages`);
  return {
    stripe,
    mail,
    env: { ...stripeFakeEnv(stripe), SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.smtpPort), SMTP_SECURE: 'false', MAIL_CATCHER_URL: mail.apiUrl },
    async stop() {
      step('Stopping the Stripe fake and the SMTP catcher');
      await Promise.all([stripe.stop(), mail.stop()]);
    },
  };
}
