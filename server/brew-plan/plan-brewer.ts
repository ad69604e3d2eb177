import { Knex } from 'knex';
import { hasAnyRole, SessionUser } from '@shared/auth';
import { BrewerChoice } from '@shared/batches';
import { AppError, forbidden } from '../errors/app-error';
import { usersRepository } from '../users/users.repository';

const isActiveBrewer = (u: { active: boolean; roles: readonly string[] }) => u.active && u.roles.includes('brewer');

/** Active members with the brewer role, by name: whom an admin may plan a batch for. */
export async function planBrewers(db: Knex): Promise<BrewerChoice[]> {
  return (await usersRepository.list(db)).filter(isActiveBrewer).map((u) => ({ id: u.id, name: u.name }));
}

/**
 * Whose batch a plan makes: the caller's, or (admins only) the active brewer named by `brewerId`.
 * Read in the plan's transaction, so a brewer deactivated meanwhile is refused.
 */
export async function plannedBrewer(trx: Knex, user: SessionUser, brewerId: number | undefined): Promise<number> {
  if (brewerId === undefined || brewerId === user.id) return user.id;
  if (!hasAnyRole(user.roles, ['admin'])) throw forbidden('Only an admin may plan a batch for another brewer.');
  const brewer = await usersRepository.findById(trx, brewerId);
  if (!brewer || !isActiveBrewer(brewer)) {
    throw new AppError('validation-failed', 'Please check these fields: brewerId.', 400, { brewerId: 'must be an active member with the brewer role' });
  }
  return brewer.id;
}
