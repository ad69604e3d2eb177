export { createKitRouter } from './kit.routes';
export { createKitService, type KitService } from './kit.service';
export { kitRepository } from './kit.repository';
