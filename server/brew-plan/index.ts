export { createBrewPlanRouter } from './brew-plan.routes';
export { createBrewPlanReads, type BrewPlanReads } from './brew-plan.service';
export { createBrewPlanWrites, type BrewPlanWrites } from './plan-writes';
export { loadPlanCalendar } from './plan-calendar';
