import { ScienceRangeError } from '@shared/science';

/** Runs one figure's calculation; a refused input becomes a problem in words instead of a figure. */
export function attempt<T>(problems: string[], what: string, calculate: () => T): T | null {
  try {
    return calculate();
  } catch (error) {
    if (error instanceof ScienceRangeError) {
      problems.push(`${what}: ${error.message}`);
      return null;
    }
    throw error;
  }
}
