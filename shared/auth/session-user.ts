import { Role } from './role';

/** The signed-in person as the client sees them. */
export interface SessionUser {
  id: number;
  email: string;
  name: string;
  roles: Role[];
}
