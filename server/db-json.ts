import { z } from 'zod';

/**
 * Reads a JSON column: MariaDB stores JSON as text, and whether the driver hands back text or an
 * object depends on its version, so the repository parses and checks it itself.
 */
export function readJsonColumn<T>(value: unknown, schema: z.ZodType<T>, where: string): T {
  let parsed: unknown = value;
  if (typeof value === 'string' || Buffer.isBuffer(value)) {
    try {
      parsed = JSON.parse(value.toString());
    } catch {
      throw new Error(`${where} holds text that is not JSON.`);
    }
  }
  const checked = schema.safeParse(parsed);
  if (!checked.success) throw new Error(`${where} does not have the stored shape: ${checked.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ')}`);
  return checked.data;
}
