import { ProductionReport } from '@shared/production-report';

/** Two months of the demo co-op (invented figures), the second one still running. */
export function generateMockProductionReport(overrides: Partial<ProductionReport> = {}): ProductionReport {
  return {
    from: '2026-10',
    to: '2026-11',
    timeZone: 'Europe/Berlin',
    fermenters: [
      { id: 1, code: 'F1', name: 'Conical fermenter 1' },
      { id: 5, code: 'F5', name: 'Conical fermenter 5' },
    ],
    months: [
      {
        month: '2026-10',
        batchesBrewed: 2,
        litresBrewed: 73,
        batchesByStatus: { planned: 1, brewing: 0, fermenting: 1, conditioning: 0, packaged: 1, archived: 1 },
        room: { inUse: 0.4194, maintenance: 0 },
        fermenters: [{ kitItemId: 1, inUse: 0.7097, maintenance: 0 }, { kitItemId: 5, inUse: 0.129, maintenance: 0 }],
        complete: true,
      },
      {
        month: '2026-11',
        batchesBrewed: 0,
        litresBrewed: 0,
        batchesByStatus: { planned: 1, brewing: 0, fermenting: 1, conditioning: 0, packaged: 1, archived: 1 },
        room: { inUse: 0.6071, maintenance: 0.0357 },
        fermenters: [{ kitItemId: 1, inUse: 0.2143, maintenance: 0.0714 }, { kitItemId: 5, inUse: 1, maintenance: 0 }],
        complete: false,
      },
    ],
    ...overrides,
  };
}
