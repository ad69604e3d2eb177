export { createPasswordResetsRouter } from './password-resets.routes';
export { createPasswordResetsService, type PasswordResetsService } from './password-resets.service';
