import { BatchSummary, Batch } from '@shared/batches';
import { KitItem } from '@shared/kit';
import { seed } from '../../scripts/setup/app-database';
import { DEMO_PASSWORD } from '../../seeds/01_demo_coop_members';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';

// The demo co-op that `npm start` seeds, checked against the product brief's demo scenario
// (invented people, kit and plans). `npm test` seeds a database of its own for this spec
// (DEMO_DB_NAME), so whole-table counts here see only the seeds.
const demoDatabase = process.env.DEMO_DB_NAME;

(demoDatabase ? describe : describe.skip)('The demo co-op seeded by npm start', () => {
  const app = useTestApp({ env: { DB_NAME: demoDatabase ?? '' } });
  const demoPerson = async (email: string) => {
    const user = await app.db('users').where({ email }).first('id');
    return { id: user!.id as number, email, password: DEMO_PASSWORD, roles: [] };
  };

  it('has the 14 people of the brief, with Ada as admin, Tomás as brewer and Priya and Jonah as members, who sign in with the printed password', async () => {
    const roles = async (email: string) => (await app.db('user_roles').join('users', 'users.id', 'user_roles.user_id').where({ email }).pluck('role')).sort();

    expect(Number((await app.db('users').count({ n: '*' }).first())!.n)).toBe(14);
    expect(await roles('ada@fernhollow.example')).toEqual(['admin', 'member']);
    expect(await roles('tomas@fernhollow.example')).toEqual(['brewer', 'member']);
    expect(await roles('priya@fernhollow.example')).toEqual(['member']);
    expect(await roles('jonah@fernhollow.example')).toEqual(['member']);
    const ada = await ApiClient.signedIn(app.app, await demoPerson('ada@fernhollow.example'));
    expect((await ada.get('/api/auth/session')).body.user.name).toBe('Ada Okafor');
  });

  it('has the kit of the brief: four 30 L fermenters F1–F4, two 60 L fermenters F5 and F6, a 50 L kettle, a chiller and a kegging set, all in service', async () => {
    const tomas = await ApiClient.signedIn(app.app, await demoPerson('tomas@fernhollow.example'));
    const kit = (await tomas.get('/api/kit')).body as KitItem[];
    const fermenters = kit.filter((item) => item.kind === 'fermenter').map((item) => [item.code, item.capacityLitres]);

    expect(fermenters).toEqual([['F1', 30], ['F2', 30], ['F3', 30], ['F4', 30], ['F5', 60], ['F6', 60]]);
    expect(kit.filter((item) => item.kind === 'kettle').map((item) => item.capacityLitres)).toEqual([50]);
    expect(kit.filter((item) => item.kind === 'chiller')).toHaveLength(1);
    expect(kit.filter((item) => item.kind === 'kegging')).toHaveLength(1);
    expect(kit.every((item) => item.state === 'in_service')).toBe(true);
  });

  it('has the two dues plans of the brief: Standard 12.00 and Supporter 25.00 EUR a month', async () => {
    const plans = await app.db('dues_plans').orderBy('amount_cents').select('name', 'amount_cents', 'currency', 'period');

    expect(plans).toEqual([
      { name: 'Standard', amount_cents: 1200, currency: 'EUR', period: 'month' },
      { name: 'Supporter', amount_cents: 2500, currency: 'EUR', period: 'month' },
    ]);
  });

  it('has the three batches of the brief: a pale ale of about 5 % fermenting, a strong dark ale of about 9 % finished, a mild of about 4 % planned (the brew plan adds more)', async () => {
    const priya = await ApiClient.signedIn(app.app, await demoPerson('priya@fernhollow.example'));
    const list = (await priya.get('/api/batches')).body as BatchSummary[];
    // The brew plan's demo adds planned batches of its own; the brief's three are the first of each kind.
    const batch = async (status: string, name: RegExp) => {
      const found = list.filter((b) => b.status === status && name.test(b.name)).sort((a, b) => a.id - b.id)[0];
      return (await priya.get(`/api/batches/${found.id}`)).body as Batch;
    };
    const [pale, dark, mild] = [await batch('fermenting', /pale/i), await batch('conditioning', /strong dark/i), await batch('planned', /mild/i)];

    // The brief's strengths are round figures: each within half a percentage point of them.
    expect(pale.recipeName).toMatch(/pale/i);
    expect(pale.predicted!.abvEstimate).toBeCloseTo(5, 0);
    expect(dark.recipeName).toMatch(/strong dark/i);
    // Finished: its strength is what its gravity log measured, not what the recipe predicted.
    expect(dark.progress.finished).toBe(true);
    expect(dark.progress.abvSoFar).toBeCloseTo(9, 0);
    expect(mild.recipeName).toMatch(/mild/i);
    expect(mild.predicted!.abvEstimate).toBeCloseTo(4, 0);
    expect(Number((await app.db('gravity_readings').where({ batch_id: pale.id }).count({ n: '*' }).first())!.n)).toBeGreaterThan(0);
  });

  it('is kept as it is when npm start seeds again, so a restart loses and doubles nothing', async () => {
    const counts = async () => Promise.all(['users', 'kit_items', 'dues_plans', 'recipes', 'batches', 'gravity_readings', 'stock_lots'].map(async (table) => Number((await app.db(table).count({ n: '*' }).first())!.n)));
    const before = await counts();

    await seed(app.db);

    expect(await counts()).toEqual(before);
  });
});
