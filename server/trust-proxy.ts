import { isIP } from 'node:net';
import { z } from 'zod';

/** Which proxies in front of the server are believed about the client's address (X-Forwarded-For). */
export type TrustProxy = false | number | string[];

const NAMED_RANGES = new Set(['loopback', 'linklocal', 'uniquelocal']);

function isAddressOrRange(entry: string): boolean {
  if (NAMED_RANGES.has(entry)) return true;
  const [address, bits, extra] = entry.split('/');
  const family = isIP(address);
  if (!family || extra !== undefined) return false;
  if (bits === undefined) return true;
  const size = Number(bits);
  return /^\d{1,3}$/.test(bits) && size <= (family === 4 ? 32 : 128);
}

/**
 * TRUST_PROXY: empty, `false` or `0` (no proxy; the default), a hop count (`1` for one reverse proxy),
 * or a comma-separated list of the proxies' addresses or ranges (`10.0.0.5, 10.1.0.0/16, loopback`).
 * `true` is refused: trusting every hop lets a client choose its own address.
 */
export const trustProxySchema = z
  .string()
  .default('false')
  .transform((raw, ctx): TrustProxy => {
    const value = raw.trim();
    if (value === '' || value === 'false' || value === '0') return false;
    if (/^\d+$/.test(value) && Number(value) <= 10) return Number(value);
    const entries = value.split(',').map((entry) => entry.trim());
    if (value !== 'true' && entries.every(isAddressOrRange)) return entries;
    ctx.addIssue({ code: 'custom', message: 'the number of proxies in front of the server (e.g. 1) or their addresses (e.g. 10.0.0.5,10.1.0.0/16); never true' });
    return z.NEVER;
  });
