export { createInvitationsRouter } from './invitations.routes';
export { createInvitationsService, type InvitationsService } from './invitations.service';
export { rolesField } from './invitations.schemas';
