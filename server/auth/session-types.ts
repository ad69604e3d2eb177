import { SessionUser } from '@shared/auth';

declare module 'express-session' {
  interface SessionData {
    /** The expiry as stored when the session was read (epoch ms), so a touch that would barely move it writes nothing. */
    storedExpiryMs?: number;
    csrfToken?: string;
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport puts the deserialised person here.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

export {};
