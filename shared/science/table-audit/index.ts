// Public entry of table-audit: each function with its one-line summary; types and constants follow.
/** Audits a (% mass, density) table: excess volumes, a Redlich–Kister fit, and the rows that stand out. */
export { auditDensityTable } from './reference-table-audit';
/** Excess molar volume of a Redlich–Kister expansion (Legendre form) at mole fraction x, cm³/mol. */
export { redlichKisterExcessVolume } from './redlich-kister';
export type { DensityTableRow, AuditedRow, TableAudit, AuditOptions } from './reference-table-audit';
