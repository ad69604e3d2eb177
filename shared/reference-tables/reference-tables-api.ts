import type { TableAudit } from '../science';

export const REFERENCE_TABLES_PATH = '/api/reference-tables';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET  /api/reference-tables                                   [any]     ReferenceTableList
 *   POST /api/reference-tables                                   [brewer]  multipart: file (CSV), name, resolution → ReferenceTableDetail (201)
 *   GET  /api/reference-tables/:tableId                          [any]     ReferenceTableDetail (rows as corrected, with the audit)
 *   PUT  /api/reference-tables/:tableId/rows/:rowId/correction   [brewer]  RowCorrectionRequest → ReferenceTableDetail
 *   PUT  /api/reference-tables/choice                            [brewer]  LabTableChoiceRequest → ReferenceTableList
 */

/** Size and kind of file a table upload accepts; the dialog states them and the server enforces them (413/415). */
export const DENSITY_TABLE_UPLOAD = { maxBytes: 200_000, maxRows: 2000, minRows: 12, extensions: ['.csv'], mimeTypes: ['text/csv', 'application/vnd.ms-excel', 'text/plain'] } as const;
/** The CSV's columns, in this order, named on its first line. */
export const DENSITY_TABLE_COLUMNS = ['massPercent', 'density', 'temperature'] as const;
/** Limits of a table's fields, shared by the server's schema and the upload form. */
export const DENSITY_TABLE_LIMITS = {
  nameMax: 100,
  resolution: { min: 0.0001, max: 1 },
  density: { min: 700, max: 1100 },
  temperature: { min: 0, max: 40 },
  noteMax: 300,
} as const;

/** An uploaded table in a list. */
export interface ReferenceTableSummary {
  id: number;
  name: string;
  temperature: number;
  resolution: number;
  rowCount: number;
  correctedCount: number;
  uploadedBy: string;
  uploadedAt: string;
}

/** The uploaded tables and which one the lab analysis reads (null: the built-in OIML R 22 equation). */
export interface ReferenceTableList {
  tables: ReferenceTableSummary[];
  labTableId: number | null;
}

/** A row as stored: the density as uploaded stays; a correction sits beside it. */
export interface ReferenceTableRow {
  id: number;
  line: number;
  massPercent: number;
  uploadedDensity: number;
  correctedDensity: number | null;
  correctionNote: string | null;
  correctedBy: string | null;
  correctedAt: string | null;
}

/** A table with its rows and the audit of the densities in use (corrected where corrected). */
export interface ReferenceTableDetail extends ReferenceTableSummary {
  rows: ReferenceTableRow[];
  audit: TableAudit;
  usedByLab: boolean;
}

/** One bad line of an uploaded file. */
export interface DensityTableProblem { line: number; reason: string }

export interface RowCorrectionRequest { density: number; note: string }
export interface LabTableChoiceRequest { tableId: number | null }
