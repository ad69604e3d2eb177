import { TestBed } from '@angular/core/testing';
import { InvitationList } from './invitation-list';

describe('InvitationList', () => {
  // IANA tz database: Pacific/Auckland is UTC+13 in December, so 20:30 UTC is the next morning there.
  it('shows the invitation day and its expiry on the co-op clock', async () => {
    TestBed.configureTestingModule({ imports: [InvitationList] });
    const fixture = TestBed.createComponent(InvitationList);
    fixture.componentRef.setInput('invitations', [
      { id: 2, email: 'new@fernhollow.example', roles: ['member'], invitedBy: 'Ines Varga', createdAt: '2026-12-02T20:30:00Z', expiresAt: '2026-12-09T20:30:00Z' },
    ]);
    fixture.componentRef.setInput('timeZone', 'Pacific/Auckland');
    await fixture.whenStable();
    const meta = (fixture.nativeElement as HTMLElement).querySelector('.meta')!.textContent!.replace(/\s+/g, ' ').trim();
    expect(meta).toBe('Invited by Ines Varga on 3 Dec 2026 · valid until 10 Dec 2026, 09:30 GMT+13');
  });
});
