export { createMailRouter } from './mail.routes';
export { createMailSender, type MailSender } from './mail-transport';
export { createOutboxDispatcher, type OutboxDispatcher } from './outbox-dispatcher';
export { outboxRepository } from './outbox.repository';
export { createOutboxService, type OutboxService } from './outbox.service';
export type { OutgoingMail } from './mail-message';
