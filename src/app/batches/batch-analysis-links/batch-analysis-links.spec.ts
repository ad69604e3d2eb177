import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { BatchAnalysisLinks } from './batch-analysis-links';

describe('BatchAnalysisLinks', () => {
  it('links the batch to its chart with the forecast and to its strength check', async () => {
    TestBed.configureTestingModule({ imports: [BatchAnalysisLinks], providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(BatchAnalysisLinks);
    fixture.componentRef.setInput('batchId', 42);
    await fixture.whenStable();

    const links = [...(fixture.nativeElement as HTMLElement).querySelectorAll('a')];

    expect(links.map((link) => [link.textContent?.trim(), link.getAttribute('href')])).toEqual([
      ['show_chart Chart and forecast', '/fermentation/42'],
      ['percent Strength check', '/strength-check/batches/42'],
    ]);
  });
});
