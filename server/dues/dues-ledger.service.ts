import { Knex } from 'knex';
import { CreateDuesPlanRequest, DuesLedger, DuesOverview, duesStatus, TEST_CARDS } from '@shared/dues';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { coopToday } from './dues-clock';
import { duesRepository, isoDate } from './dues.repository';

/** What members and officers read about dues: a member's overview, the ledger, and the plans. */
export function createDuesLedgerService(deps: { db: Knex; coopTimeZone: string; testMode: boolean; now?: () => Date }) {
  const { db } = deps;
  const now = deps.now ?? (() => new Date());
  const today = () => coopToday(now(), deps.coopTimeZone);

  return {
    async overview(userId: number): Promise<DuesOverview> {
      const [plans, membership, payments] = await Promise.all([duesRepository.listPlans(db), duesRepository.findMembership(db, userId), duesRepository.paymentsOf(db, userId)]);
      const paidThrough = isoDate(membership?.paid_through ?? null);
      const plan = plans.find((each) => each.id === membership?.plan_id);
      return {
        plans: plans.filter((each) => each.active),
        membership: {
          planId: plan?.id ?? null,
          planName: plan?.name ?? null,
          paidThrough,
          status: duesStatus(paidThrough, today()),
          renewByCard: Boolean(membership?.renew_by_card),
          savedCard: membership?.renew_by_card ? membership.saved_card : null,
        },
        payments,
        testMode: deps.testMode,
        testCards: deps.testMode ? TEST_CARDS : [],
      };
    },

    /** A member stops renewal: the saved card is forgotten. */
    async stopRenewal(userId: number): Promise<void> {
      await db.transaction(async (trx) => {
        await duesRepository.lockMembership(trx, userId);
        await duesRepository.updateMembership(trx, userId, { renew_by_card: false, stripe_customer_id: null, saved_card: null });
        await recordAudit(trx, { actorUserId: userId, action: 'dues-renewal-stopped', subjectType: 'user', subjectId: userId });
      });
    },

    async ledger(): Promise<DuesLedger> {
      const [rows, payments, plans] = await Promise.all([duesRepository.membersWithDues(db), duesRepository.recentPayments(db, 500), duesRepository.listPlans(db)]);
      const day = today();
      return {
        members: rows.map((row) => ({
          userId: row.user_id,
          name: row.name,
          email: row.email,
          planName: row.plan_name,
          paidThrough: isoDate(row.paid_through),
          status: duesStatus(isoDate(row.paid_through), day),
          renewByCard: Boolean(row.renew_by_card),
        })),
        payments,
        plans,
      };
    },

    async createPlan(actorId: number, request: CreateDuesPlanRequest): Promise<number> {
      if (await duesRepository.planNameTaken(db, request.name)) throw new AppError('plan-name-taken', 'A plan with this name exists already.', 409, { name: 'is taken' });
      return db.transaction(async (trx) => {
        const id = await duesRepository.insertPlan(trx, request, actorId);
        await recordAudit(trx, { actorUserId: actorId, action: 'dues-plan-created', subjectType: 'dues_plan', subjectId: id, detail: { ...request } });
        return id;
      });
    },

    /** Retires or restores a plan; members already on it keep their paid-through date. */
    async setPlanActive(actorId: number, planId: number, active: boolean): Promise<void> {
      if (!(await duesRepository.findPlan(db, planId))) throw new AppError('plan-not-found', 'No plan has this id.', 404);
      await db.transaction(async (trx) => {
        await duesRepository.setPlanActive(trx, planId, active);
        await recordAudit(trx, { actorUserId: actorId, action: active ? 'dues-plan-restored' : 'dues-plan-retired', subjectType: 'dues_plan', subjectId: planId });
      });
    },
  };
}

export type DuesLedgerService = ReturnType<typeof createDuesLedgerService>;
