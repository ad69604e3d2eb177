import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { ReferenceTableDetail, ReferenceTableList, RowCorrectionRequest } from '@shared/reference-tables';
import { auditDensityTable, ScienceRangeError } from '@shared/science';
import { LabTable } from '@shared/strength-check';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { parseDensityTableCsv } from './density-table-csv';
import { referenceTablesRepository as repo } from './reference-tables.repository';

const tableNotFound = () => new AppError('table-not-found', 'No density table has this id.', 404);

/** The density tables brewers upload, audit and correct, and the lab's choice among them. */
export function createReferenceTablesService(db: Knex) {
  async function detail(id: number): Promise<ReferenceTableDetail> {
    const table = await repo.find(db, id);
    if (!table) throw tableNotFound();
    const rows = await repo.rows(db, id);
    const inUse = rows.map((r) => ({ massPercent: r.massPercent, density: r.correctedDensity ?? r.uploadedDensity }));
    const audit = auditDensityTable(inUse, table.temperature, { resolution: table.resolution });
    return { ...table, rows, audit, usedByLab: (await repo.labTableId(db)) === id };
  }

  return {
    detail,

    /** The table the lab analysis reads, with the densities in use; null for the built-in equation. */
    async labTable(): Promise<{ id: number; name: string; lab: LabTable } | null> {
      const id = await repo.labTableId(db);
      const table = id === null ? null : await repo.find(db, id);
      if (!table) return null;
      const rows = (await repo.rows(db, table.id)).map((r) => ({ massPercent: r.massPercent, density: r.correctedDensity ?? r.uploadedDensity }));
      return { id: table.id, name: table.name, lab: { temperature: table.temperature, rows } };
    },

    async list(): Promise<ReferenceTableList> {
      const [tables, labTableId] = await Promise.all([repo.list(db), repo.labTableId(db)]);
      return { tables, labTableId };
    },

    /** Stores an uploaded CSV as a new table, refusing it whole (400, each bad line named) when any line is bad. */
    async upload(user: SessionUser, meta: { name: string; resolution: number }, csv: string): Promise<ReferenceTableDetail> {
      const parsed = parseDensityTableCsv(csv);
      if (parsed.problems.length > 0 || parsed.temperature === null) {
        const fields = Object.fromEntries(parsed.problems.map((p) => [`line ${p.line}`, p.reason]));
        throw new AppError('table-rejected', `The table was not stored: ${parsed.problems.length} line(s) need fixing.`, 400, fields);
      }
      try {
        auditDensityTable(parsed.rows, parsed.temperature, { resolution: meta.resolution });
      } catch (error) {
        if (error instanceof ScienceRangeError) throw new AppError('table-rejected', `The table cannot be audited: ${error.message}.`, 400, { file: error.message });
        throw error;
      }
      const id = await db.transaction(async (trx) => {
        const newId = await repo.insert(trx, { ...meta, temperature: parsed.temperature!, userId: user.id, rows: parsed.rows });
        await recordAudit(trx, { actorUserId: user.id, action: 'density-table-uploaded', subjectType: 'density_table', subjectId: newId, detail: { rows: parsed.rows.length } });
        return newId;
      });
      return detail(id);
    },

    /** Corrects one row; the uploaded density stays beside the correction. */
    async correct(user: SessionUser, tableId: number, rowId: number, correction: RowCorrectionRequest): Promise<ReferenceTableDetail> {
      if (!(await repo.find(db, tableId))) throw tableNotFound();
      if (!(await repo.rowBelongs(db, tableId, rowId))) throw new AppError('row-not-found', 'This table has no row with this id.', 404);
      await db.transaction(async (trx) => {
        await repo.addCorrection(trx, rowId, correction.density, correction.note, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'density-table-row-corrected', subjectType: 'density_table', subjectId: tableId, detail: { rowId, ...correction } });
      });
      return detail(tableId);
    },

    async chooseLabTable(user: SessionUser, tableId: number | null): Promise<ReferenceTableList> {
      if (tableId !== null && !(await repo.find(db, tableId))) throw tableNotFound();
      await db.transaction(async (trx) => {
        await repo.setLabTable(trx, tableId, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'lab-table-chosen', subjectType: 'lab_settings', subjectId: 1, detail: { tableId } });
      });
      return this.list();
    },
  };
}

export type ReferenceTablesService = ReturnType<typeof createReferenceTablesService>;
