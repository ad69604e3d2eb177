export { createProfileRouter } from './profile.routes';
export { createProfileService, type ProfileService } from './profile.service';
