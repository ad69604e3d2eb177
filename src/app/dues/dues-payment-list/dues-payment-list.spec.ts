import { TestBed } from '@angular/core/testing';
import { DuesPayment } from '@shared/dues';
import { DuesPaymentList } from './dues-payment-list';

const payment: DuesPayment = {
  id: 4, userId: 7, memberName: 'Ines Varga', planName: 'Yearly', amountCents: 4800, currency: 'EUR', method: 'cash', kind: 'payment',
  status: 'succeeded', periodStart: '2026-12-03', periodEnd: '2027-12-02', paidAt: '2026-12-02T20:30:00Z', refundedAt: null,
};

describe('DuesPaymentList', () => {
  async function render(timeZone: string): Promise<HTMLElement> {
    TestBed.configureTestingModule({ imports: [DuesPaymentList] });
    const fixture = TestBed.createComponent(DuesPaymentList);
    fixture.componentRef.setInput('payments', [payment]);
    fixture.componentRef.setInput('showMember', true);
    fixture.componentRef.setInput('refundable', true);
    fixture.componentRef.setInput('timeZone', timeZone);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  // IANA tz database: Pacific/Auckland is UTC+13 in December, so a payment at 20:30 UTC falls on the next day there.
  it('dates a payment by the co-op day, in the row and in the refund button name', async () => {
    const row = (await render('Pacific/Auckland')).querySelector('tbody tr')!;
    expect(row.querySelector('td')!.textContent!.trim()).toBe('3 Dec 2026');
    expect(row.querySelector('button')!.getAttribute('aria-label')).toBe('Refund payment of Ines Varga on 3 Dec 2026');
  });
});
