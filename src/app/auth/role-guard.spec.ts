import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, provideRouter, Router, RouterStateSnapshot, UrlTree } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { Role } from '@shared/auth';
import { firstValueFrom, Observable } from 'rxjs';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { roleGuard } from './role-guard';
import { initialAuthState } from './state/auth.feature';

describe('roleGuard', () => {
  let store: MockStore;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideMockStore({ initialState: { auth: initialAuthState } })],
    });
    store = TestBed.inject(MockStore);
  });

  function answerFor(roles: Role[] | null): Promise<boolean | UrlTree> {
    store.setState({
      auth: { ...initialAuthState, sessionLoaded: true, user: roles ? generateMockSessionUser(roles) : null },
    });
    const guard = roleGuard(['admin']);
    const result = TestBed.runInInjectionContext(() =>
      guard({} as ActivatedRouteSnapshot, { url: '/members' } as RouterStateSnapshot),
    ) as Observable<boolean | UrlTree>;
    return firstValueFrom(result);
  }

  const serialized = (answer: boolean | UrlTree) => TestBed.inject(Router).serializeUrl(answer as UrlTree);

  it('lets an admin through', async () => {
    await expect(answerFor(['member', 'admin'])).resolves.toBe(true);
  });

  it('sends a member without the admin role to /not-allowed', async () => {
    expect(serialized(await answerFor(['member', 'brewer']))).toBe('/not-allowed');
  });

  it('sends a signed-out visitor to /sign-in', async () => {
    expect(serialized(await answerFor(null))).toBe('/sign-in');
  });
});
