import { HttpErrorResponse } from '@angular/common/http';
import { Router } from '@angular/router';
import { Actions, ROOT_EFFECTS_INIT } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of, Subject, throwError } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { ShellActions } from '@app/core/shell/shell.actions';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { AuthClient } from '../auth-client';
import { AuthApiActions } from './auth-api.actions';
import {
  loadSession,
  navigateAfterSessionExpired,
  navigateAfterSignIn,
  navigateAfterSignOut,
  signIn,
  signOut,
} from './auth.effects';
import { SignInPageActions } from './sign-in-page.actions';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof AuthClient, () => Observable<unknown>>>) =>
  overrides as unknown as AuthClient;
const refusal = (status: number, body: object) => new HttpErrorResponse({ status, error: body });
const submitted = SignInPageActions.submitted({
  credentials: { email: 'priya.raman@fernhollow.example', password: 'correct horse' },
  returnUrl: '/members',
});

describe('auth effects', () => {
  describe('loadSession', () => {
    it('maps the session probe at start-up to Session Loaded Success', async () => {
      const user = generateMockSessionUser();
      const client = fakeClient({ session: () => of({ user, coopTimeZone: 'Europe/Berlin' }) });

      const result = await firstValueFrom(loadSession(actionsOf({ type: ROOT_EFFECTS_INIT }), client));

      expect(result).toEqual(AuthApiActions.sessionLoadedSuccess({ user, coopTimeZone: 'Europe/Berlin' }));
    });

    it('maps an unreachable server to Session Loaded Failure with a message', async () => {
      const client = fakeClient({ session: () => throwError(() => new HttpErrorResponse({ status: 0 })) });

      const result = await firstValueFrom(loadSession(actionsOf({ type: ROOT_EFFECTS_INIT }), client));

      expect(result.type).toBe(AuthApiActions.sessionLoadedFailure.type);
      expect(result).toHaveProperty('message', expect.stringMatching(/could not be reached/));
    });
  });

  describe('signIn', () => {
    it('maps an accepted sign-in to Sign In Success carrying the return address', async () => {
      const user = generateMockSessionUser();
      const client = fakeClient({ signIn: () => of({ user }) });

      const result = await firstValueFrom(signIn(actionsOf(submitted), client));

      expect(result).toEqual(AuthApiActions.signInSuccess({ user, returnUrl: '/members' }));
    });

    it('maps a 401 to Sign In Failure with the server message', async () => {
      const client = fakeClient({
        signIn: () =>
          throwError(() => refusal(401, { error: { code: 'invalid-credentials', message: 'E-mail or password is wrong.' } })),
      });

      const result = await firstValueFrom(signIn(actionsOf(submitted), client));

      expect(result).toEqual(AuthApiActions.signInFailure({ message: 'E-mail or password is wrong.', retryAfterSeconds: null, fields: null }));
    });

    it('maps a 429 to Sign In Failure keeping retryAfterSeconds', async () => {
      const body = { error: { code: 'too-many-attempts', message: 'Too many attempts.', retryAfterSeconds: 300 } };
      const client = fakeClient({ signIn: () => throwError(() => refusal(429, body)) });

      const result = await firstValueFrom(signIn(actionsOf(submitted), client));

      expect(result).toEqual(AuthApiActions.signInFailure({ message: 'Too many attempts.', retryAfterSeconds: 300, fields: null }));
    });

    it('maps a 400 to Sign In Failure keeping the reasons per field', async () => {
      const body = { error: { code: 'validation-failed', message: 'Check the form.' }, fields: { email: 'Give a full address.' } };
      const client = fakeClient({ signIn: () => throwError(() => refusal(400, body)) });

      const result = await firstValueFrom(signIn(actionsOf(submitted), client));

      expect(result).toEqual(
        AuthApiActions.signInFailure({ message: 'Check the form.', retryAfterSeconds: null, fields: { email: 'Give a full address.' } }),
      );
    });

    it('ignores further submissions while a sign-in is on its way (exhaustMap)', () => {
      const answer = new Subject<{ user: ReturnType<typeof generateMockSessionUser> }>();
      const calls = jest.fn(() => answer);
      const emitted: Action[] = [];

      signIn(actionsOf(submitted, submitted), fakeClient({ signIn: calls })).subscribe((action) => emitted.push(action));
      answer.next({ user: generateMockSessionUser() });

      expect(calls).toHaveBeenCalledTimes(1);
      expect(emitted).toHaveLength(1);
    });
  });

  describe('signOut', () => {
    it('maps Sign Out Clicked to Sign Out Success when the server answers', async () => {
      const client = fakeClient({ signOut: () => of(undefined) });

      const result = await firstValueFrom(signOut(actionsOf(ShellActions.signOutClicked()), client));

      expect(result).toEqual(AuthApiActions.signOutSuccess());
    });
  });

  describe('navigation', () => {
    it('navigateAfterSignIn goes to the return address', async () => {
      const router = { navigateByUrl: jest.fn() } as unknown as Router;
      const user = generateMockSessionUser();

      await firstValueFrom(navigateAfterSignIn(actionsOf(AuthApiActions.signInSuccess({ user, returnUrl: '/members' })), router));

      expect(router.navigateByUrl).toHaveBeenCalledWith('/members');
    });

    it('navigateAfterSignIn refuses a return address on another origin', async () => {
      const router = { navigateByUrl: jest.fn() } as unknown as Router;
      const user = generateMockSessionUser();
      const action = AuthApiActions.signInSuccess({ user, returnUrl: '//elsewhere.example/phish' });

      await firstValueFrom(navigateAfterSignIn(actionsOf(action), router));

      expect(router.navigateByUrl).toHaveBeenCalledWith('/today');
    });

    it('navigateAfterSignOut goes to the sign-in page', async () => {
      const router = { navigate: jest.fn() } as unknown as Router;

      await firstValueFrom(navigateAfterSignOut(actionsOf(AuthApiActions.signOutSuccess()), router));

      expect(router.navigate).toHaveBeenCalledWith(['/sign-in']);
    });

    it('navigateAfterSessionExpired tells the person and sends them to sign in, remembering the page', async () => {
      const router = { navigate: jest.fn(), url: '/members' } as unknown as Router;
      const notifier = { notify: jest.fn() } as unknown as Notifier;

      await firstValueFrom(navigateAfterSessionExpired(actionsOf(AuthApiActions.sessionExpired()), router, notifier));

      expect(notifier.notify).toHaveBeenCalledWith(expect.stringContaining('session has ended'), 8000);
      expect(router.navigate).toHaveBeenCalledWith(['/sign-in'], { queryParams: { returnUrl: '/members' } });
    });
  });
});
