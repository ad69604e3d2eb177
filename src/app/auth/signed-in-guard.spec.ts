import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, provideRouter, Router, RouterStateSnapshot, UrlTree } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { firstValueFrom, isObservable, Observable } from 'rxjs';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { signedInGuard } from './signed-in-guard';
import { initialAuthState } from './state/auth.feature';

describe('signedInGuard', () => {
  let store: MockStore;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideMockStore({ initialState: { auth: initialAuthState } })],
    });
    store = TestBed.inject(MockStore);
  });

  function runGuard(url: string): Observable<boolean | UrlTree> {
    const result = TestBed.runInInjectionContext(() =>
      signedInGuard({} as ActivatedRouteSnapshot, { url } as RouterStateSnapshot),
    );
    if (!isObservable(result)) {
      throw new Error('signedInGuard should answer with an observable');
    }
    return result as Observable<boolean | UrlTree>;
  }

  it('lets a signed-in person through once the session is loaded', async () => {
    store.setState({ auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser() } });

    await expect(firstValueFrom(runGuard('/today'))).resolves.toBe(true);
  });

  it('sends a signed-out visitor to /sign-in with the return address', async () => {
    store.setState({ auth: { ...initialAuthState, sessionLoaded: true } });

    const result = await firstValueFrom(runGuard('/members'));

    expect(TestBed.inject(Router).serializeUrl(result as UrlTree)).toBe('/sign-in?returnUrl=%2Fmembers');
  });

  it('waits for the session probe before deciding', async () => {
    let decided: boolean | UrlTree | undefined;
    runGuard('/today').subscribe((answer) => (decided = answer));

    expect(decided).toBeUndefined();
    store.setState({ auth: { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser() } });

    expect(decided).toBe(true);
  });
});
