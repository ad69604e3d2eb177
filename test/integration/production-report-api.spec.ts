import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import { ApiClient } from './helpers/api-client';
import { startBatch } from './helpers/batch-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Production report API', () => {
  const t = useTestApp();

  const admin = async () => ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));

  /** A fermenter of its own (24 h turnaround), so its figures belong to this test alone. */
  async function ownFermenter(code: string): Promise<number> {
    const [id] = await t.db('kit_items').insert({ code, name: 'Report test fermenter', kind: 'fermenter', capacity_litres: 30, turnaround_hours: 24, state: 'in_service' });
    return id;
  }

  /** A 25 L batch in the fermenter, brewed 3 Mar 2024 and packaged 20 Mar 2024 (dates entered after the fact). */
  async function brewInMarch2024(client: ApiClient, fermenterId: number) {
    const batch = await startBatch(client, { name: 'Report test batch', fermenterId, plannedVolumeLitres: 25 });
    for (const [status, at] of [['brewing', '2024-03-03T00:00:00Z'], ['fermenting', '2024-03-03T12:00:00Z'], ['packaged', '2024-03-20T00:00:00Z']]) {
      const res = await client.send('post', `/api/batches/${batch.id}/status`, { status, at, confirmSkip: true });
      if (res.status !== 200) throw new Error(`moving to ${status} failed: ${res.status} ${JSON.stringify(res.body)}`);
    }
    return batch;
  }

  it('when an admin asks for a month, then the fermenter’s share of it in use and under maintenance counts in the co-op’s zone', async () => {
    expect(t.config.coopTimeZone).toBe('Europe/Berlin');
    const officer = await createUser(t.db, ['member', 'admin']);
    const client = await ApiClient.signedIn(t.app, officer);
    const code = `R${Date.now() % 1_000_000}`;
    const fermenterId = await ownFermenter(code);
    await brewInMarch2024(client, fermenterId);
    await t.db('bookings').insert({
      kit_item_id: fermenterId, user_id: officer.id, created_by_user_id: officer.id, purpose: 'maintenance', batch_id: null, note: '', time_zone: 'Europe/Berlin',
      starts_at: new Date('2024-03-25T00:00:00Z'), ends_at: new Date('2024-03-26T00:00:00Z'), held_until: new Date('2024-03-26T00:00:00Z'),
    });

    const res = await client.get('/api/reports/production?from=2024-02&to=2024-03');

    expect(res.status).toBe(200);
    expect(res.body.months.map((m: { month: string }) => m.month)).toEqual(['2024-02', '2024-03']);
    const march = res.body.months[1];
    // March 2024 in Berlin: 1 Mar 00:00 CET to 1 Apr 00:00 CEST (clocks forward 31 Mar, Directive 2000/84/EC) = 31 × 24 − 1 = 743 h.
    // Held 3 Mar 12:00Z → 21 Mar 00:00Z (packaged 20 Mar + 24 h turnaround) = 420 h: 420 / 743 = 0.56528.
    // Maintenance 25 Mar → 26 Mar = 24 h: 24 / 743 = 0.03230.
    expect(march.fermenters.find((f: { kitItemId: number }) => f.kitItemId === fermenterId)).toEqual({ kitItemId: fermenterId, inUse: 0.5653, maintenance: 0.0323 });
    expect(march.litresBrewed).toBeGreaterThanOrEqual(25);
    expect(march.batchesBrewed).toBeGreaterThanOrEqual(1);
    expect(march.complete).toBe(true);
    expect(res.body.fermenters).toContainEqual({ id: fermenterId, code, name: 'Report test fermenter' });
  });

  it('when an admin exports the report, then the CSV has one line per month, the named columns, and neutralised cells', async () => {
    const client = await admin();
    const code = `=R${Date.now() % 1_000_000}`;
    const fermenterId = await ownFermenter(code);
    await brewInMarch2024(client, fermenterId);

    const res = await client.get('/api/reports/production.csv?from=2024-03&to=2024-03');

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain('production-2024-03-to-2024-03.csv');
    const [header, march, ...rest] = parse(res.text) as string[][];
    expect(rest).toEqual([]);
    expect(header.slice(0, 12)).toEqual([
      'Month', 'Complete', 'Litres brewed', 'Batches brewed',
      'Planned at month end', 'Brewing at month end', 'Fermenting at month end', 'Conditioning at month end', 'Packaged at month end', 'Archived at month end',
      'Room in use %', 'Room under maintenance %',
    ]);
    // A code a spreadsheet would read as a formula gets a leading apostrophe.
    const column = header.indexOf(`'${code} in use %`);
    expect(column).toBeGreaterThan(11);
    expect(march[0]).toBe('2024-03');
    expect(march[1]).toBe('yes');
    expect(march[column]).toBe('56.5');
  });

  it('when a member or a brewer asks, then it answers 403', async () => {
    const member = await ApiClient.signedIn(t.app, await createUser(t.db, ['member']));
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));

    for (const client of [member, brewer]) {
      expect((await client.get('/api/reports/production?from=2024-03&to=2024-03')).status).toBe(403);
      expect((await client.get('/api/reports/production.csv?from=2024-03&to=2024-03')).status).toBe(403);
    }
  });

  it('when the months are impossible, then it answers 400 naming the field', async () => {
    const client = await admin();
    const nextMonth = DateTime.now().setZone(t.config.coopTimeZone).plus({ months: 1 }).toFormat('yyyy-MM');
    const cases: [string, string][] = [
      ['from=2024-13&to=2024-12', 'from'],
      ['from=2024-03', 'to'],
      ['from=2024-05&to=2024-03', 'to'],
      ['from=2020-01&to=2024-03', 'to'],
      [`from=2024-03&to=${nextMonth}`, 'to'],
    ];

    for (const [query, field] of cases) {
      const res = await client.get(`/api/reports/production?${query}`);
      expect([query, res.status]).toEqual([query, 400]);
      expect(res.body.fields).toHaveProperty(field);
    }
  });
});
