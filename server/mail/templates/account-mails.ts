import { MailContent } from '../mail-message';
import { renderMail } from './mail-layout';

/** An invitation to join, with its one-time link. */
export function invitationMail(input: { link: string; expiresAt: Date; invitedBy: string }): MailContent {
  return renderMail({
    subject: 'You are invited to join the co-op on Commonwort',
    greeting: 'Hello,',
    paragraphs: [`${input.invitedBy} has invited you to the co-op's workbench, where members design recipes, book the shared kit and keep their dues.`],
    facts: [['Link valid until', input.expiresAt.toUTCString()]],
    action: { label: 'Join the co-op', url: input.link },
    closing: 'If you did not expect this invitation, you can ignore this message.',
  });
}

/** A link that sets a new password. */
export function passwordResetMail(input: { name: string; link: string; expiresAt: Date }): MailContent {
  return renderMail({
    subject: 'Set a new Commonwort password',
    greeting: `Hello ${input.name},`,
    paragraphs: ['Someone (we hope you) asked to set a new password for your Commonwort account. The link works once.'],
    facts: [['Link valid until', input.expiresAt.toUTCString()]],
    action: { label: 'Set a new password', url: input.link },
    closing: 'If you did not ask for this, ignore this message: your password stays as it is.',
  });
}
