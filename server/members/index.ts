export { createMembersRouter } from './members.routes';
export { createMembersService, type MembersService } from './members.service';
