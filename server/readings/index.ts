export { createBatchReadingsRouter } from './batch-readings.routes';
export { createReadingsRouter } from './readings.routes';
export { createPushRouter } from './push.routes';
export { createReadingsService, type ReadingsService } from './readings.service';
export { createPushTokensService, type PushTokensService } from './push-tokens.service';
export { DEFAULT_PUSH_RATE_LIMIT, type PushRateLimit } from './push-rate-limit';
