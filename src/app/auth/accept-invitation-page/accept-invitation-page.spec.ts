import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { AcceptInvitationPageActions } from '../state/accept-invitation-page.actions';
import { AccountState, initialAccountState } from '../state/account.feature';
import { initialAuthState } from '../state/auth.feature';
import { AcceptInvitationPage } from './accept-invitation-page';

const invitation = { email: 'new.member@fernhollow.example', roles: ['member' as const, 'brewer' as const], expiresAt: '2026-12-08T10:00:00Z' };

describe('AcceptInvitationPage', () => {
  let fixture: ComponentFixture<AcceptInvitationPage>;
  let store: MockStore;

  async function render(account: Partial<AccountState>): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [AcceptInvitationPage],
      providers: [provideRouter([]), provideMockStore({ initialState: { account: { ...initialAccountState, ...account }, auth: { ...initialAuthState, coopTimeZone: 'Pacific/Auckland' } } })],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(AcceptInvitationPage);
    fixture.componentRef.setInput('token', 'invite-token');
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  /** Types into the field whose label reads `label`, as a person would find it. */
  function type(element: HTMLElement, label: string, value: string): void {
    const field = [...element.querySelectorAll('mat-form-field')].find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!;
    const input = field.querySelector<HTMLInputElement>('input')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  const joinButton = (element: HTMLElement) =>
    [...element.querySelectorAll('button')].find((button) => button.textContent?.trim() === 'Join the co-op')!;

  it('dispatches Opened with the token from the link', async () => {
    await render({});

    expect(store.dispatch).toHaveBeenCalledWith(AcceptInvitationPageActions.opened({ token: 'invite-token' }));
  });

  it('shows the invited e-mail and roles', async () => {
    const element = await render({ invitation, invitationStatus: 'ready' });

    expect(element.textContent).toContain('new.member@fernhollow.example');
    const badges = [...element.querySelectorAll('cw-role-badge')].map((badge) => badge.textContent?.trim());
    expect(badges).toEqual(['member', 'brewer']);
  });

  // IANA tz database: Pacific/Auckland is UTC+13 in December, so 10:00 UTC is 23:00 the same day there.
  it('shows the expiry on the co-op clock from the session probe', async () => {
    const element = await render({ invitation, invitationStatus: 'ready' });

    expect(element.textContent).toContain('8 Dec 2026, 23:00 GMT+13');
  });

  it('dispatches Submitted with name and password when both passwords match', async () => {
    const element = await render({ invitation, invitationStatus: 'ready' });
    type(element, 'Your name', ' Priya Raman ');
    type(element, 'Password', 'a long pass phrase');
    type(element, 'Confirm password', 'a long pass phrase');

    joinButton(element).click();
    await fixture.whenStable();

    expect(store.dispatch).toHaveBeenCalledWith(
      AcceptInvitationPageActions.submitted({ token: 'invite-token', name: 'Priya Raman', password: 'a long pass phrase' }),
    );
  });

  it('shows a mismatch at the confirm field and dispatches nothing when the passwords differ', async () => {
    const element = await render({ invitation, invitationStatus: 'ready' });
    type(element, 'Your name', 'Priya Raman');
    type(element, 'Password', 'a long pass phrase');
    type(element, 'Confirm password', 'another pass phrase');

    joinButton(element).click();
    await fixture.whenStable();

    expect(element.textContent).toContain('The two passwords differ.');
    expect(store.dispatch).not.toHaveBeenCalledWith(expect.objectContaining({ type: AcceptInvitationPageActions.submitted.type }));
  });

  it('shows the refusal and no form for an unknown invitation', async () => {
    const element = await render({ invitationStatus: 'not-found', error: 'This invitation is unknown.' });

    expect(element.querySelector('[role="alert"]')?.textContent).toContain('This invitation is unknown.');
    expect(element.querySelector('form')).toBeNull();
  });
});
