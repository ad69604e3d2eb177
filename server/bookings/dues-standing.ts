/** Whether a person may make new bookings; when not, what to tell them (why, and how to pay). */
export type DuesStandingResult = { mayBook: true } | { mayBook: false; reason: string; howToPay: string };

/** Asks the dues records about one person. */
export type DuesStanding = (userId: number) => Promise<DuesStandingResult>;

/** Until the co-op keeps dues in the app, everyone may book. */
export const everyoneMayBook: DuesStanding = async () => ({ mayBook: true });
