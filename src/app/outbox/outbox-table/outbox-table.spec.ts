import { TestBed } from '@angular/core/testing';
import { OutboxMessageSummary } from '@shared/mail';
import { OutboxTable } from './outbox-table';

const message: OutboxMessageSummary = {
  id: 1, kind: 'invitation', recipient: 'new@fernhollow.example', subject: 'Join the co-op', state: 'failed', attempts: 2,
  lastError: 'connection refused', nextAttemptAt: '2026-12-02T21:05:00Z', sentAt: null, createdAt: '2026-12-02T20:30:00Z',
};

describe('OutboxTable', () => {
  async function render(timeZone: string): Promise<HTMLElement> {
    TestBed.configureTestingModule({ imports: [OutboxTable] });
    const fixture = TestBed.createComponent(OutboxTable);
    fixture.componentRef.setInput('messages', [message]);
    fixture.componentRef.setInput('timeZone', timeZone);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  // IANA tz database: Pacific/Auckland keeps daylight time (UTC+13) in December, so 20:30 UTC is 09:30 the next day there.
  it('shows when a message was written and its next try on the co-op clock, not the browser one', async () => {
    const row = (await render('Pacific/Auckland')).querySelector('tbody tr')!;
    expect(row.textContent).toContain('3 Dec 2026, 09:30 GMT+13');
    expect(row.textContent).toContain('next try 3 Dec 2026, 10:05 GMT+13');
  });
});
