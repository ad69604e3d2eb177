import { effect, Signal, untracked } from '@angular/core';

/**
 * Runs `act` each time `count` changes. Containers count what succeeded (bookings made, plans saved),
 * so a form clears after each success and keeps what was typed after a failure. Call it in an
 * injection context (a constructor or field initialiser).
 */
export function onCountChange(count: Signal<number>, act: () => void): void {
  let seen = count();
  effect(() => {
    const now = count();
    if (now === seen) return;
    seen = now;
    untracked(act);
  });
}
