export { createDuesRouter } from './dues.routes';
export { createDuesLedgerService, type DuesLedgerService } from './dues-ledger.service';
export { createDuesPaymentsService, type DuesPaymentsService } from './dues-payments.service';
export { createDuesRenewalsService, type DuesRenewalsService, type UpcomingBookingsCounter } from './dues-renewals.service';
export { createDuesStanding, type DuesStanding, type DuesStandingResult } from './dues-standing.service';
export { createStripeGateway, type StripeGateway } from './stripe-gateway';
