import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';

// House rule: SQL lives only in repositories (files named *.repository.ts), so a query is found,
// reviewed and reused in one place. This spec fails when a query is written anywhere else.
const SERVER = __dirname;

/** A table named in a query (`db('users')`, `trx('lots')`) or raw SQL. */
const QUERY = /\b(db|trx|knex|tx|transaction)\(\s*['"`]|\.raw\(/;

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts') ? [path] : [];
  });
}

describe('SQL lives only in repositories', () => {
  it('no server file outside a *.repository.ts names a table in a query or runs raw SQL', () => {
    const offenders = sourceFiles(SERVER)
      .filter((path) => !path.endsWith('.repository.ts'))
      .filter((path) => QUERY.test(readFileSync(path, 'utf8')))
      .map((path) => relative(SERVER, path));

    expect(offenders).toEqual([]);
  });

  it('the check recognises a query when it sees one', () => {
    expect(QUERY.test("await db('users').where({ id })")).toBe(true);
    expect(QUERY.test("trx.raw('SELECT 1')")).toBe(true);
    expect(QUERY.test('usersRepository.update(trx, id, changes)')).toBe(false);
  });
});
