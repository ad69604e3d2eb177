export { createStrengthCheckRouter } from './strength-check.routes';
export { createStrengthCheckService, type StrengthCheckService } from './strength-check.service';
