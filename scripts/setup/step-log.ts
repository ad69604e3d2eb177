/** Console output of the start and test tasks: one line per step, failures with a fix. */
export function step(message: string): void {
  console.log(`\u25b8 ${message}`);
}

export function done(message: string): void {
  console.log(`\u2714 ${message}`);
}

/** An expected failure of set-up: what went wrong and how to fix it. */
export class SetupError extends Error {
  constructor(
    message: string,
    readonly fix: string,
  ) {
    super(message);
  }
}

/** Prints a set-up failure in the house format and returns the exit code. */
export function reportFailure(error: unknown): number {
  if (error instanceof SetupError) {
    console.error(`\u2716 ${error.message}\n  How to fix: ${error.fix}`);
  } else {
    console.error('\u2716 Set-up failed unexpectedly:', error);
  }
  return 1;
}
