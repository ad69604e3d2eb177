import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { provideMockStore } from '@ngrx/store/testing';
import { Role } from '@shared/auth';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { initialBatchesState } from '@app/batches/state/batches.feature';
import { BatchSummary } from '@shared/batches';
import { initialStockState } from '@app/stock/state/stock.feature';
import { StockAlerts } from '@shared/stock';
import { TodayPage } from './today-page';

const fermenting: BatchSummary = {
  id: 7, name: 'Test pale', status: 'fermenting', brewerId: 1, brewerName: 'Priya Raman', brewDate: '2026-11-28', plannedVolumeLitres: 20,
  fermenterId: 1, fermenterCode: 'F1', recipeId: null, recipeVersion: null,
  progress: { latestSg: 1.0123, latestAt: '2026-12-01T10:00:00Z', readingCount: 12, apparentAttenuationPercent: 76.4, abvSoFar: 5.1, finished: true, stuck: false },
  forecast: {
    status: 'forecast', finalGravity: 1.0118, finalGravityLow: 1.0112, finalGravityHigh: 1.0127,
    finishTime: Date.UTC(2026, 11, 2, 23, 30), finishTimeEarly: Date.UTC(2026, 11, 2, 6), finishTimeLate: Date.UTC(2026, 11, 3, 12),
  },
};

describe('TodayPage', () => {
  async function render(roles: Role[], batches: BatchSummary[] = [], alerts: StockAlerts | null = null): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [TodayPage],
      providers: [
        provideRouter([]),
        provideMockStore({
          initialState: {
            auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser(roles), coopTimeZone: 'Europe/Berlin' },
            batches: { ...initialBatchesState, mine: true, ids: batches.map((b) => b.id), entities: Object.fromEntries(batches.map((b) => [b.id, b])) },
            stock: { ...initialStockState, alerts },
          },
        }),
      ],
    });
    const fixture = TestBed.createComponent(TodayPage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('greets the person by name under an h1 "Today" and shows their roles', async () => {
    const element = await render(['member', 'brewer']);

    expect(element.querySelector('h1')?.textContent).toBe('Today');
    expect(element.textContent).toContain('Welcome, Priya Raman.');
    expect([...element.querySelectorAll('cw-role-badge')].map((badge) => badge.textContent?.trim())).toEqual(['member', 'brewer']);
  });

  it('shows a member the cards of the areas open to them so far', async () => {
    const element = await render(['member']);

    const links = [...element.querySelectorAll<HTMLAnchorElement>('cw-area-card a')];
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/recipes', '/batches', '/gravity-log', '/strength-check', '/reference-tables', '/kit-room', '/brew-plan', '/stock', '/dues']);
  });

  it('lists my active batches with latest gravity, attenuation, the finished flag and the forecast', async () => {
    const element = await render(['member'], [fermenting]);

    const row = element.querySelector('cw-my-batches li')!;
    expect(row.querySelector('a')?.getAttribute('href')).toBe('/gravity-log/7');
    expect(row.textContent).toContain('Fermenting · F1');
    expect(row.textContent).toContain('SG 1.012');
    expect(row.textContent).toContain('76 % attenuated');
    expect(row.textContent).toContain('Looks finished');
    // The finish at 23:30 UTC on 2 Dec falls on 3 Dec in the co-op's zone.
    expect(row.querySelector('[data-testid="today-forecast"]')?.textContent).toBe('Forecast FG 1.012 (1.011–1.013), finished about 3 Dec (2 Dec–3 Dec)');
  });

  it('shows Members and Outbox cards to an admin', async () => {
    const element = await render(['member', 'admin']);

    const links = [...element.querySelectorAll<HTMLAnchorElement>('cw-area-card a')];
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/recipes', '/batches', '/gravity-log', '/strength-check', '/reference-tables', '/kit-room', '/brew-plan', '/stock', '/dues', '/members', '/outbox']);
  });

  it('shows a brewer low stock and best-before alerts in their units', async () => {
    const alerts: StockAlerts = {
      lowStock: [{ ingredientId: 3, ingredientName: 'Demo pale malt', ingredientKind: 'fermentables', unit: 'kg', onHand: 2, reorderLevel: 10 }],
      bestBefore: [{ lotId: 9, ingredientName: 'Demo hop', ingredientKind: 'hops', unit: 'kg', onHand: 0.03, bestBefore: '2026-11-30', expired: true }],
    };
    const element = await render(['member', 'brewer'], [], alerts);

    const items = [...element.querySelectorAll('cw-stock-alerts li')].map((li) => li.textContent?.trim());
    expect(items).toEqual(['Low: Demo pale malt, 2 kg left (reorder at 10 kg)', 'Past best-before 2026-11-30: Demo hop, 30 g in lot 9']);
  });

  it('shows a member no stock alerts', async () => {
    const element = await render(['member'], [], { lowStock: [], bestBefore: [] });

    expect(element.querySelector('cw-stock-alerts')).toBeNull();
  });
});
