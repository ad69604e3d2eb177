import { Component, input } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { ProductionReport } from '@shared/production-report';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockProductionReport } from '@app/testing/production-report-mock';
import { ProductionCharts } from '../production-charts/production-charts';
import { monthsEndingNow } from '../report-range';
import { ProductionReportPageActions } from '../state/production-report-page.actions';
import { initialProductionReportState, ProductionReportState } from '../state/production-report.feature';
import { ProductionReportPage } from './production-report-page';

/** Canvas charts do not draw in jsdom; their data is checked in production-chart-data.spec. */
@Component({ selector: 'cw-production-charts', template: '' })
class ChartsStub {
  readonly report = input.required<ProductionReport>();
}

describe('ProductionReportPage', () => {
  let fixture: ComponentFixture<ProductionReportPage>;
  let store: MockStore;

  async function render(state: Partial<ProductionReportState> = {}): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [ProductionReportPage],
      providers: [
        provideMockStore({
          initialState: {
            auth: { ...initialAuthState, sessionLoaded: true, coopTimeZone: 'Europe/Berlin' },
            productionReport: { ...initialProductionReportState, ...state },
          },
        }),
      ],
    });
    TestBed.overrideComponent(ProductionReportPage, { remove: { imports: [ProductionCharts] }, add: { imports: [ChartsStub] } });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(ProductionReportPage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('asks for the 12 months ending this month in the co-op zone and links the CSV of the same months', async () => {
    const element = await render();
    const range = monthsEndingNow(12, 'Europe/Berlin');

    expect(store.dispatch).toHaveBeenCalledWith(ProductionReportPageActions.opened(range));
    const link = element.querySelector<HTMLAnchorElement>('a[download]')!;
    expect(link.getAttribute('href')).toBe(`/api/reports/production.csv?from=${range.from}&to=${range.to}`);
    expect(link.getAttribute('download')).toBe(`production-${range.from}-to-${range.to}.csv`);
  });

  it('shows each month’s figures in the table, this month marked as so far', async () => {
    const element = await render({ report: generateMockProductionReport() });

    const rows = [...element.querySelectorAll('tbody tr')].map((tr) => [...tr.querySelectorAll('th, td')].map((c) => c.textContent?.trim()));
    expect(rows).toEqual([
      ['Oct 2026', '73.0 L', '2', '1 planned · 1 fermenting · 1 packaged · 1 archived', '41.9 %', '0.0 %', '71.0 %', '12.9 %'],
      ['Nov 2026 (so far)', '0.0 L', '0', '1 planned · 1 fermenting · 1 packaged · 1 archived', '60.7 %', '3.6 %', '21.4 %', '100.0 %'],
    ]);
  });

  it('asks again when the admin picks another number of months', async () => {
    const element = await render({ report: generateMockProductionReport() });

    const six = [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === '6 months')!;
    six.click();

    expect(store.dispatch).toHaveBeenCalledWith(ProductionReportPageActions.rangeChanged(monthsEndingNow(6, 'Europe/Berlin')));
  });

  it('says why when the report cannot be loaded', async () => {
    const element = await render({ loadError: 'The production report could not be loaded.' });

    expect(element.querySelector('[role="alert"]')?.textContent).toContain('could not be loaded');
  });
});
