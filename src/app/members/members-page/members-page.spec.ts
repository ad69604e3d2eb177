import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockInvitation, generateMockMember } from '@app/testing/member-mock';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { MembersPageActions } from '../state/members-page.actions';
import { initialMembersState, membersAdapter, MembersState } from '../state/members.feature';
import { MembersPage } from './members-page';

describe('MembersPage', () => {
  let fixture: ComponentFixture<MembersPage>;
  let store: MockStore;
  const jonah = generateMockMember();

  async function render(members: Partial<MembersState> = {}): Promise<HTMLElement> {
    const state = membersAdapter.setAll([jonah], { ...initialMembersState, ...members });
    TestBed.configureTestingModule({
      imports: [MembersPage],
      providers: [
        provideMockStore({
          initialState: {
            auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser(['member', 'admin'], { id: 1 }) },
            members: state,
          },
        }),
      ],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(MembersPage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('dispatches Opened when shown and renders the h1 and the member rows', async () => {
    const element = await render();

    expect(store.dispatch).toHaveBeenCalledWith(MembersPageActions.opened());
    expect(element.querySelector('h1')?.textContent).toBe('Members');
    expect(element.querySelectorAll('cw-member-table tbody tr')).toHaveLength(1);
  });

  it('dispatches Roles Changed when a role is toggled in the table', async () => {
    const element = await render();

    element.querySelector<HTMLButtonElement>('button[aria-label="admin role for Jonah Weiss"]')!.click();

    expect(store.dispatch).toHaveBeenCalledWith(MembersPageActions.rolesChanged({ memberId: jonah.id, roles: ['member', 'admin'] }));
  });

  it('dispatches Invitation Submitted with the e-mail and the default member role', async () => {
    const element = await render();
    const email = element.querySelector<HTMLInputElement>('cw-invite-form input[type="email"]')!;
    email.value = 'new.member@fernhollow.example';
    email.dispatchEvent(new Event('input'));

    [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Send invitation')!.click();
    await fixture.whenStable();

    expect(store.dispatch).toHaveBeenCalledWith(
      MembersPageActions.invitationSubmitted({ request: { email: 'new.member@fernhollow.example', roles: ['member'] } }),
    );
  });

  it('shows a freshly created invitation link in the element e2e tests look for', async () => {
    const element = await render({
      issuedLink: { kind: 'invitation', email: 'new@fernhollow.example', link: 'https://coop.example/invitations/tok', expiresAt: '2026-12-08T10:00:00Z' },
    });

    expect(element.querySelector('[data-testid="invitation-link"]')?.textContent).toBe('https://coop.example/invitations/tok');
  });

  it('dispatches Invitation Revoked from the pending list', async () => {
    const invitation = generateMockInvitation();
    const element = await render({ invitations: [invitation] });

    element.querySelector<HTMLButtonElement>(`button[aria-label="Revoke the invitation for ${invitation.email}"]`)!.click();

    expect(store.dispatch).toHaveBeenCalledWith(MembersPageActions.invitationRevoked({ invitationId: invitation.id }));
  });

  it('shows the load failure instead of the table', async () => {
    const element = await render({ loadError: 'The members could not be loaded.' });

    expect(element.querySelector('[role="alert"]')?.textContent).toContain('The members could not be loaded.');
    expect(element.querySelector('cw-member-table')).toBeNull();
  });
});
