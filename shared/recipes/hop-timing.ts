import { HopItem, HopUse } from './recipe-design';

/** Longest time a hop row accepts: minutes for every use but dry hop, days for dry hop. */
export const MAX_HOP_TIME = 300;

/**
 * Temperature a whirlpool or hop stand is assumed to hold, °C: the design records only the stand's
 * minutes, and stands are usually made once the wort has cooled below the boil (common practice).
 */
export const HOP_STAND_TEMPERATURE_C = 80;

/** The unit a hop row's time is given in. */
export function hopTimeUnit(use: HopUse): 'min' | 'days' {
  return use === 'dry hop' ? 'days' : 'min';
}

/** Why a hop row's time does not fit the boil, or null when it does; boil additions cannot outlast the boil. */
export function hopTimeProblem(hop: Pick<HopItem, 'use' | 'time'>, boilMinutes: number): string | null {
  if (hop.use === 'boil' && hop.time > boilMinutes) return `must be at most the boil time, ${boilMinutes} min`;
  return null;
}

/** When an addition goes in, in the same words on the editor and the brew-day sheet. */
export function hopTimingText(use: HopUse, time: number): string {
  switch (use) {
    case 'first wort':
      return 'First wort, the whole boil';
    case 'boil':
      return time === 0 ? 'Flame-out' : `${time} min before the end of the boil`;
    case 'whirlpool':
      return `Whirlpool, ${time} min stand at about ${HOP_STAND_TEMPERATURE_C} °C`;
    default:
      return `Dry hop, ${time} ${time === 1 ? 'day' : 'days'} before packaging`;
  }
}
