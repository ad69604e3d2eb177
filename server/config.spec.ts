import { loadConfig } from './config';

describe('loadConfig', () => {
  const minimal = { DB_PASSWORD: 'secret', SESSION_SECRET: 'x'.repeat(32) };

  it('when only the secrets are given, then the defaults fill the rest', () => {
    const config = loadConfig(minimal);
    expect(config).toMatchObject({ port: 4300, host: '127.0.0.1', publicUrl: 'http://127.0.0.1:4300', db: { port: 3407, database: 'commonwort' } });
  });

  it('when variables are invalid, then it throws naming every one of them', () => {
    expect(() => loadConfig({ ...minimal, PORT: 'eighty', SESSION_SECRET: 'short', DB_NAME: 'Bad-Name' })).toThrow(/PORT[\s\S]*DB_NAME[\s\S]*SESSION_SECRET|PORT[\s\S]*SESSION_SECRET/);
  });

  it('when PUBLIC_URL ends in a slash, then links are built without a double slash', () => {
    expect(loadConfig({ ...minimal, PUBLIC_URL: 'https://brew.example/' }).publicUrl).toBe('https://brew.example');
  });

  it('when COOP_TIME_ZONE is not an IANA zone, then it is refused; a valid one is kept', () => {
    expect(() => loadConfig({ ...minimal, COOP_TIME_ZONE: 'Mars/Olympus' })).toThrow(/COOP_TIME_ZONE/);
    expect(loadConfig({ ...minimal, COOP_TIME_ZONE: 'Europe/Dublin' }).coopTimeZone).toBe('Europe/Dublin');
  });
});
