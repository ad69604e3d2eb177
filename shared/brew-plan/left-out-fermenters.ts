import { DateTime } from 'luxon';
import { PlanFermenter } from './busy-interval';
import { fermenterFits, Slot } from './propose-slots';

/** Why the planner proposed no slot on a fermenter. */
export type LeftOutReason =
  /** `until`: when the batch is expected to hand the fermenter back (ISO instant), else null: when packaged. */
  | { kind: 'held'; batchId: number; batchName: string; until: string | null }
  | { kind: 'too-small'; capacityLitres: number | null }
  | { kind: 'out-of-service' }
  | { kind: 'no-free-slot' };

export interface LeftOutFermenter {
  kitItemId: number;
  kitItemCode: string;
  kitItemName: string;
  reason: LeftOutReason;
  /** The reason in words, shown as is. */
  message: string;
}

/** A batch fermenting or conditioning in a fermenter: it keeps the fermenter until packaged, or its expected release. */
export interface FermenterHold {
  kitItemId: number;
  batchId: number;
  batchName: string;
  /** The expected release, cleaning included (ms; `expectedRelease`); null when only packaging tells. */
  until: number | null;
}

/** The reason in words; a day is the co-op's (`zone`). */
export function leftOutMessage(reason: LeftOutReason, volumeLitres: number, zone: string): string {
  switch (reason.kind) {
    case 'held':
      return reason.until === null
        ? `Held by batch "${reason.batchName}" until it is packaged (no gravity forecast to go by yet).`
        : `Held by batch "${reason.batchName}" until about ${DateTime.fromISO(reason.until, { zone }).toFormat('d LLL yyyy', { locale: 'en-GB' })} ` +
            '(its gravity forecast, conditioning, packaging and cleaning), and no free slot after that within the search.';
    case 'too-small':
      return reason.capacityLitres === null ? 'No capacity recorded in the kit room.' : `Too small: holds ${reason.capacityLitres} L, the batch is ${volumeLitres} L.`;
    case 'out-of-service':
      return 'Out of service (under maintenance).';
    case 'no-free-slot':
      return 'No free slot for the whole schedule within the search.';
  }
}

/**
 * Every fermenter without a proposal and why: out of service first, then too small, then held by a
 * batch (until packaged, or its expected release), else no free slot was found in the searched weeks.
 */
export function leftOutFermenters(
  fermenters: readonly PlanFermenter[],
  slots: readonly Slot[],
  holds: readonly FermenterHold[],
  volumeLitres: number,
  zone: string,
): LeftOutFermenter[] {
  const proposed = new Set(slots.map((s) => s.fermenter.id));
  return fermenters
    .filter((f) => !proposed.has(f.id))
    .map((f): LeftOutFermenter => {
      const hold = holds.find((h) => h.kitItemId === f.id);
      const reason: LeftOutReason = !f.inService
        ? { kind: 'out-of-service' }
        : !fermenterFits(f, volumeLitres)
          ? { kind: 'too-small', capacityLitres: f.capacityLitres }
          : hold
            ? { kind: 'held', batchId: hold.batchId, batchName: hold.batchName, until: hold.until === null ? null : new Date(hold.until).toISOString() }
            : { kind: 'no-free-slot' };
      return { kitItemId: f.id, kitItemCode: f.code, kitItemName: f.name, reason, message: leftOutMessage(reason, volumeLitres, zone) };
    })
    .sort((a, b) => a.kitItemCode.localeCompare(b.kitItemCode));
}
