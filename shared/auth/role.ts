/** The roles of the co-op; a person may hold several. */
export const ROLES = ['member', 'brewer', 'admin'] as const;

export type Role = (typeof ROLES)[number];

/** True when the holder of `roles` holds at least one of `allowed`. */
export function hasAnyRole(roles: readonly Role[], allowed: readonly Role[]): boolean {
  return roles.some((role) => allowed.includes(role));
}
