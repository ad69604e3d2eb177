export { createReportsRouter } from './reports.routes';
export { createProductionReportService, type ProductionReportService } from './production-report.service';
