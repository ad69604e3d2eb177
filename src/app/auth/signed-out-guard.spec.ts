import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, provideRouter, Router, RouterStateSnapshot, UrlTree } from '@angular/router';
import { provideMockStore } from '@ngrx/store/testing';
import { SessionUser } from '@shared/auth';
import { firstValueFrom, Observable } from 'rxjs';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { signedOutGuard } from './signed-out-guard';
import { initialAuthState } from './state/auth.feature';

describe('signedOutGuard', () => {
  function answerFor(user: SessionUser | null): Promise<boolean | UrlTree> {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideMockStore({ initialState: { auth: { ...initialAuthState, sessionLoaded: true, user } } })],
    });
    const result = TestBed.runInInjectionContext(() =>
      signedOutGuard({} as ActivatedRouteSnapshot, { url: '/sign-in' } as RouterStateSnapshot),
    ) as Observable<boolean | UrlTree>;
    return firstValueFrom(result);
  }

  it('shows the sign-in page to a signed-out visitor', async () => {
    await expect(answerFor(null)).resolves.toBe(true);
  });

  it('sends a signed-in person from the sign-in page to /today', async () => {
    const answer = await answerFor(generateMockSessionUser());

    expect(TestBed.inject(Router).serializeUrl(answer as UrlTree)).toBe('/today');
  });
});
