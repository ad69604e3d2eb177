import nodemailer from 'nodemailer';
import { Config } from '../config';
import { OutgoingMail } from './mail-message';

/** Sends one message over SMTP; rejects when the server cannot be reached or refuses it. */
export type MailSender = (mail: Pick<OutgoingMail, 'to' | 'subject' | 'text' | 'html'>) => Promise<void>;

const isLoopback = (host: string) => host === 'localhost' || host.startsWith('127.') || host === '::1';

/** A nodemailer transport for the configured SMTP server; a local catcher gets plain SMTP without STARTTLS. */
export function createMailSender(smtp: Config['smtp']): MailSender {
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    ignoreTLS: isLoopback(smtp.host),
    auth: smtp.user ? { user: smtp.user, pass: smtp.password ?? '' } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 15000,
  });
  return async (mail) => {
    await transport.sendMail({ from: smtp.from, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
  };
}
