import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { Role } from '@shared/auth';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { Shell } from './shell';
import { ShellActions } from './shell.actions';

describe('Shell', () => {
  let fixture: ComponentFixture<Shell>;
  let store: MockStore;

  async function render(roles: Role[]): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [Shell],
      providers: [
        provideRouter([]),
        provideMockStore({
          initialState: { auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser(roles) } },
        }),
      ],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(Shell);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  const navLabels = (element: HTMLElement) =>
    [...element.querySelectorAll('nav[aria-label="Areas"] a [matListItemTitle]')].map((title) => title.textContent?.trim());

  it('shows the product name and a single main landmark', async () => {
    const element = await render(['member']);

    expect(element.querySelector('.brand')?.textContent).toContain('Commonwort');
    expect(element.querySelectorAll('main')).toHaveLength(1);
  });

  it('lists the built areas open to everyone in the navigation of a member', async () => {
    expect(navLabels(await render(['member']))).toEqual(['Today', 'Recipes', 'Batches', 'Gravity log', 'Strength check', 'Reference tables', 'Kit room', 'Brew plan', 'Stock', 'Dues']);
  });

  it('adds Members and Outbox to the navigation of an admin', async () => {
    expect(navLabels(await render(['member', 'admin']))).toEqual(['Today', 'Recipes', 'Batches', 'Gravity log', 'Strength check', 'Reference tables', 'Kit room', 'Brew plan', 'Stock', 'Dues', 'Members', 'Outbox']);
  });

  it('dispatches Sign Out Clicked from the account menu', async () => {
    const element = await render(['member']);

    element.querySelector<HTMLButtonElement>('button[aria-label="Account menu"]')!.click();
    await fixture.whenStable();
    const item = [...document.querySelectorAll<HTMLButtonElement>('[role="menuitem"]')].find(
      (button) => button.textContent?.trim().endsWith('Sign out'),
    );
    item!.click();

    expect(store.dispatch).toHaveBeenCalledWith(ShellActions.signOutClicked());
  });
});
