export { createReferenceTablesRouter } from './reference-tables.routes';
export { createReferenceTablesService, type ReferenceTablesService } from './reference-tables.service';
