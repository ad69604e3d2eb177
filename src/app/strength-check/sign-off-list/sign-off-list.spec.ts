import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { SignOffList } from './sign-off-list';

describe('SignOffList', () => {
  // IANA tz database: Pacific/Auckland is UTC+13 in December.
  it('shows when each sign-off was made on the co-op clock', async () => {
    TestBed.configureTestingModule({ imports: [SignOffList], providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(SignOffList);
    fixture.componentRef.setInput('batchId', 3);
    fixture.componentRef.setInput('signOffs', [{ id: 9, declaredPercentVolume: 6.2, verdict: 'within', signedBy: 'Ines Varga', signedAt: '2026-12-02T20:30:00Z', stale: false }]);
    fixture.componentRef.setInput('timeZone', 'Pacific/Auckland');
    await fixture.whenStable();
    const item = (fixture.nativeElement as HTMLElement).querySelector('[data-testid="sign-off-9"]')!;
    expect(item.textContent).toContain('signed by Ines Varga, 3 Dec 2026, 09:30 GMT+13');
  });
});
