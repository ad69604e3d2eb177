import fc from 'fast-check';
import { CSRF_HEADER } from '@server/auth';
import { ROLES } from '@shared/auth';
import { ApiClient } from './helpers/api-client';
import { ApiRoute, listApiRoutes } from './helpers/route-table';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

const RUNS_PER_ROUTE = 10;

// Sign-out would end the fuzzing admin's session, leaving every later call a plain 401.
const SKIPPED = new Set(['POST /api/auth/sign-out']);

// Field names the API uses, so generated bodies get past the first shallow checks and reach deeper ones.
const FIELD_NAMES = ['name', 'email', 'password', 'token', 'roles', 'active', 'design', 'visibility', 'notes', 'csv', 'commit', 'retired',
  'kind', 'alphaAcidPercent', 'batchVolumeLitres', 'fermentables', 'hops', 'mashSteps', 'yeastId', 'styleId', 'unitSystem', 'amount'];

const hostileString = fc.oneof(
  fc.string(),
  fc.string({ unit: 'binary' }),
  fc.constantFrom('\ud800', 'a\udfffb', 'Stout \ud83c', '\u0000', ' ', 'x'.repeat(5000), '<script>alert(1)</script>', '1e308', '0x10'),
);
const hugeNumber = fc.oneof(fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -0, 5e-324), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer());

function deeplyNested(depth: number): unknown {
  let value: unknown = 'bottom';
  for (let i = 0; i < depth; i++) value = i % 2 ? [value] : { design: value };
  return value;
}

const { value: jsonValue } = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: 'small', withCrossShrink: true }, hostileString, hugeNumber, fc.boolean(), fc.constant(null), tie('array'), tie('object')),
  array: fc.array(tie('value'), { maxLength: 5 }),
  object: fc.dictionary(fc.oneof(fc.constantFrom(...FIELD_NAMES), hostileString), tie('value'), { maxKeys: 6 }),
}));

const body = fc.oneof(
  fc.dictionary(fc.constantFrom(...FIELD_NAMES), jsonValue, { maxKeys: 8 }),
  jsonValue,
  fc.integer({ min: 20, max: 80 }).map(deeplyNested),
);

// Ids of rows that cannot exist or are malformed: a fuzzer must never change another test's rows.
const idParam = fc.oneof(
  fc.bigInt({ min: 10n ** 12n, max: 10n ** 20n }).map(String),
  fc.constantFrom('0', '-1', '0x10', '1e3', '1 ', '01', '9'.repeat(400), '%F0%9F%8D%BA', '%ED%A0%80'),
  fc.string({ minLength: 1, maxLength: 20 }).map(encodeURIComponent),
);
const otherParam = fc.oneof(fc.string({ minLength: 1, maxLength: 120 }).map(encodeURIComponent), fc.constantFrom('hops', 'fermentables', 'a'.repeat(43)));

function pathFor(route: ApiRoute, ids: string[], others: string[]): string {
  let i = 0;
  return route.path.replace(/:(\w+)/g, (_m, name: string) => (name.endsWith('Id') || name === 'version' ? ids[i++ % ids.length] : others[i++ % others.length]));
}

describe('Every API route under arbitrary input', () => {
  const t = useTestApp();

  it('when routes get arbitrary bodies, ids and strings (lone surrogates, deep nesting, huge numbers), then none answers a 5xx', async () => {
    const routes = listApiRoutes(t.app).filter((route) => !SKIPPED.has(`${route.method} ${route.path}`));
    expect(routes.length).toBeGreaterThan(20);
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, [...ROLES]));
    // Each route gets its own runs, so every route of the table is exercised, including ones added later.
    for (const route of routes) {
      const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      await fc.assert(
        fc.asyncProperty(fc.array(idParam, { minLength: 2, maxLength: 2 }), fc.array(otherParam, { minLength: 2, maxLength: 2 }), body, async (ids, others, payload) => {
          const path = pathFor(route, ids, others);
          const res =
            method === 'get'
              ? await admin.get(path)
              : await admin.agent[method](path).set(CSRF_HEADER, admin.csrfToken()).set('Content-Type', 'application/json').send(JSON.stringify(payload) ?? 'null');
          if (res.status >= 500) throw new Error(`${route.method} ${path} answered ${res.status}: ${res.text.slice(0, 300)}`);
        }),
        { numRuns: RUNS_PER_ROUTE },
      );
    }
  }, 180_000);
});
