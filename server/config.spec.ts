import { coopTimeZoneFrom, loadConfig } from './config';

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

  it('when the seeds read the co-op zone alone, then they get what the server would, without its secrets', () => {
    expect(coopTimeZoneFrom({})).toBe(loadConfig(minimal).coopTimeZone);
    expect(coopTimeZoneFrom({ COOP_TIME_ZONE: 'Europe/Dublin' })).toBe('Europe/Dublin');
    expect(() => coopTimeZoneFrom({ COOP_TIME_ZONE: 'Mars/Olympus' })).toThrow();
  });

  it('when TRUST_PROXY is a hop count or a list of addresses, then exactly those proxies are trusted; true is refused', () => {
    expect(loadConfig(minimal).trustProxy).toBe(false);
    expect(loadConfig({ ...minimal, TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ ...minimal, TRUST_PROXY: '10.0.0.5, 10.1.0.0/16,loopback' }).trustProxy).toEqual(['10.0.0.5', '10.1.0.0/16', 'loopback']);
    expect(() => loadConfig({ ...minimal, TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY/);
    expect(() => loadConfig({ ...minimal, TRUST_PROXY: '10.0.0.300' })).toThrow(/TRUST_PROXY/);
    expect(() => loadConfig({ ...minimal, TRUST_PROXY: '10.0.0.0/33' })).toThrow(/TRUST_PROXY/);
  });
});
