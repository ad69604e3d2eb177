import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { provideMockStore } from '@ngrx/store/testing';
import { Role } from '@shared/auth';
import { initialAuthState } from '@app/auth/state/auth.feature';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { TodayPage } from './today-page';

describe('TodayPage', () => {
  async function render(roles: Role[]): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [TodayPage],
      providers: [
        provideRouter([]),
        provideMockStore({
          initialState: { auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser(roles) } },
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

  it('shows a member the cards of the other built areas open to everyone', async () => {
    const element = await render(['member']);

    const links = [...element.querySelectorAll<HTMLAnchorElement>('cw-area-card a')];
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/recipes', '/strength-check', '/reference-tables', '/kit-room']);
  });

  it('shows a Members card linking to /members for an admin', async () => {
    const element = await render(['member', 'admin']);

    const links = [...element.querySelectorAll<HTMLAnchorElement>('cw-area-card a')];
    expect(links.map((link) => link.getAttribute('href'))).toEqual(['/recipes', '/strength-check', '/reference-tables', '/kit-room', '/members']);
  });
});
