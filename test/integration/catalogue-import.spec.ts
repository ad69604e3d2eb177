import { randomUUID } from 'node:crypto';
import { CATALOGUE_CSV_MAX_BYTES } from '@shared/recipes';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Catalogue CSV import', () => {
  const t = useTestApp();

  const brewer = async () => ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
  const tag = () => randomUUID().slice(0, 8);
  const HEADER = 'name,alphaAcidPercent,form';

  it('when a file has a ragged row, a bad number, an in-file duplicate and an existing name, then all four are reported by line', async () => {
    const client = await brewer();
    const t1 = tag();
    await client.send('post', '/api/ingredients/hops', { name: `Kept hop ${t1}`, alphaAcidPercent: 5, form: 'pellet' });
    const csv = [
      HEADER,
      `Cafe hop ${t1},5,pellet`,
      `Ragged hop ${t1},5`,
      `Hex hop ${t1},0x10,pellet`,
      `Café hop ${t1},6,pellet`,
      `KEPT HOP ${t1},7,whole`,
      `Fine hop ${t1},4,pellet`,
    ].join('\n');
    const res = await client.send('post', '/api/ingredients/hops/import', { csv, commit: false });
    expect(res.status).toBe(200);
    expect(res.body.problems).toEqual([
      { line: 3, reason: 'has 2 values where the header names 3 columns' },
      { line: 4, reason: 'alphaAcidPercent must be a number' },
      { line: 5, reason: `name "Café hop ${t1}" is the same as "Cafe hop ${t1}" on line 2` },
    ]);
    expect(res.body.existing).toEqual([{ line: 6, name: `KEPT HOP ${t1}`, existingId: expect.any(Number), existingName: `Kept hop ${t1}` }]);
    const committed = await client.send('post', '/api/ingredients/hops/import', { csv, commit: true, choices: [{ line: 6, choice: 'update' }] });
    expect(committed.body).toMatchObject({ imported: 0, updated: 0 });
    expect(await t.db('hops').where('name', 'like', `%${t1}`)).toHaveLength(1);
  });

  it('when names already exist, then the brewer chooses per name to skip or update, and new rows are added', async () => {
    const client = await brewer();
    const t2 = tag();
    const kept = (await client.send('post', '/api/ingredients/hops', { name: `Skip me ${t2}`, alphaAcidPercent: 5, form: 'pellet' })).body;
    const changed = (await client.send('post', '/api/ingredients/hops', { name: `Update me ${t2}`, alphaAcidPercent: 5, form: 'pellet' })).body;
    const csv = [HEADER, `skip me ${t2},9,whole`, `update me ${t2},9,whole`, `New one ${t2},3,pellet`].join('\n');
    const undecided = await client.send('post', '/api/ingredients/hops/import', { csv, commit: true });
    expect(undecided.body.problems.map((p: { line: number }) => p.line)).toEqual([2, 3]);
    expect(undecided.body.imported).toBe(0);
    const choices = [{ line: 2, choice: 'skip' }, { line: 3, choice: 'update' }];
    const done = await client.send('post', '/api/ingredients/hops/import', { csv, commit: true, choices });
    expect(done.body).toMatchObject({ imported: 1, updated: 1, skipped: 1, problems: [] });
    expect(await t.db('hops').where({ id: kept.id }).first()).toMatchObject({ name: `Skip me ${t2}`, alpha_acid_percent: 5, form: 'pellet' });
    expect(await t.db('hops').where({ id: changed.id }).first()).toMatchObject({ name: `Update me ${t2}`, alpha_acid_percent: 9, form: 'whole' });
    const added = await t.db('hops').where({ name: `New one ${t2}` }).first();
    expect(added!.ingredient_id).toEqual(expect.any(Number));
  });

  it('when a file is larger than the 100 kB API body limit but within 1 MB, then it is read; beyond 1 MB it answers 400 naming csv', async () => {
    const client = await brewer();
    const row = `Big hop ${tag()},5,pellet\n`;
    const fits = HEADER + '\n' + row.repeat(Math.floor((CATALOGUE_CSV_MAX_BYTES - 100) / row.length));
    expect(fits.length).toBeGreaterThan(100_000);
    const ok = await client.send('post', '/api/ingredients/hops/import', { csv: fits, commit: false });
    expect(ok.status).toBe(200);
    const tooBig = fits + row.repeat(10);
    const refused = await client.send('post', '/api/ingredients/hops/import', { csv: tooBig, commit: false });
    expect(refused.status).toBe(400);
    expect(refused.body.fields).toEqual({ csv: 'must be at most 1 MB' });
  }, 90_000);
});
