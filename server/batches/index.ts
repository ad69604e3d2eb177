export { createBatchesRouter } from './batches.routes';
export { createBatchesService, type BatchesService } from './batches.service';
