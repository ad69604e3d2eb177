import { ApiClient } from './helpers/api-client';
import { densityTableCsv } from './helpers/density-table-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Reference tables API', () => {
  const t = useTestApp();

  const brewer = async () => ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
  const member = async () => ApiClient.signedIn(t.app, await createUser(t.db));
  const upload = (client: ApiClient, csv: string, name = 'Test table', file = 'table.csv', contentType = 'text/csv') =>
    client.upload('/api/reference-tables', { name, resolution: '0.01' }, { name: file, content: csv, contentType });

  it('when a brewer uploads a table with a mistyped row, then it is stored and the audit marks that row with a suggested density', async () => {
    const res = await upload(await brewer(), densityTableCsv(20, 0.9));

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ temperature: 20, resolution: 0.01, rowCount: 21, correctedCount: 0 });
    const flagged = res.body.audit.flagged;
    expect(flagged.map((r: { massPercent: number }) => r.massPercent)).toEqual([45]);
    expect(flagged[0].suggestedDensity).toBeCloseTo(flagged[0].density - 0.9, 1);
    expect(flagged[0].bumpCm3PerMol).not.toBe(0);
  });

  it('when a brewer corrects the row, then the audit re-runs clean and the uploaded density stays stored', async () => {
    const client = await brewer();
    const table = (await upload(client, densityTableCsv(20, 0.9))).body;
    const row = table.rows.find((r: { massPercent: number }) => r.massPercent === 45);
    const suggested = Math.round(table.audit.flagged[0].suggestedDensity * 100) / 100;

    const res = await client.send('put', `/api/reference-tables/${table.id}/rows/${row.id}/correction`, { density: suggested, note: 'typo in print' });

    expect(res.status).toBe(200);
    expect(res.body.audit.flagged).toEqual([]);
    const corrected = res.body.rows.find((r: { id: number }) => r.id === row.id);
    expect(corrected).toMatchObject({ uploadedDensity: row.uploadedDensity, correctedDensity: suggested, correctionNote: 'typo in print' });
    expect(Number((await t.db('density_table_rows').where({ id: row.id }).first())!.density)).toBe(row.uploadedDensity);
    expect(await t.db('audit_log').where({ action: 'density-table-row-corrected', subject_id: table.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('when a file has bad lines, then it answers 400 naming each line and stores nothing', async () => {
    const lines = densityTableCsv().split('\n');
    lines[3] = '10,lots,20';
    const uploader = await createUser(t.db, ['member', 'brewer']);
    const res = await upload(await ApiClient.signedIn(t.app, uploader), lines.join('\n'));

    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ 'line 4': expect.stringContaining('density "lots"') });
    // Other spec files upload tables meanwhile: only this brewer's count.
    expect(await t.db('density_tables').where({ uploaded_by_user_id: uploader.id })).toHaveLength(0);
  });

  it('when the file is not CSV or too large, then it answers 415 or 413', async () => {
    const client = await brewer();
    expect((await upload(client, '%PDF-1.4', 'Test', 'table.pdf', 'application/pdf')).status).toBe(415);
    const huge = densityTableCsv() + '#'.repeat(250_000);
    expect((await upload(client, huge)).status).toBe(413);
  });

  it('when a brewer chooses a table for the lab, then the list says so; a member cannot choose', async () => {
    const client = await brewer();
    const table = (await upload(client, densityTableCsv(20))).body;

    const chosen = await client.send('put', '/api/reference-tables/choice', { tableId: table.id });
    expect(chosen.body.labTableId).toBe(table.id);
    expect((await client.get(`/api/reference-tables/${table.id}`)).body.usedByLab).toBe(true);
    expect((await (await member()).send('put', '/api/reference-tables/choice', { tableId: null })).status).toBe(403);
    expect((await client.send('put', '/api/reference-tables/choice', { tableId: null })).body.labTableId).toBeNull();
  });

  it('when a member uploads, then it answers 403', async () => {
    expect((await upload(await member(), densityTableCsv())).status).toBe(403);
  });
});
