import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { authFeature, AuthState, initialAuthState } from '../state/auth.feature';
import { SignInPageActions } from '../state/sign-in-page.actions';
import { SignInPage } from './sign-in-page';

describe('SignInPage', () => {
  let fixture: ComponentFixture<SignInPage>;
  let store: MockStore;

  async function render(auth: Partial<AuthState> = {}): Promise<HTMLElement> {
    TestBed.configureTestingModule({
      imports: [SignInPage],
      providers: [provideRouter([]), provideMockStore({ initialState: { auth: { ...initialAuthState, ...auth } } })],
    });
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
    fixture = TestBed.createComponent(SignInPage);
    fixture.componentRef.setInput('returnUrl', '/members');
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  function fill(element: HTMLElement, label: 'email' | 'password', value: string): void {
    const input = element.querySelector<HTMLInputElement>(`input[formcontrolname="${label}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  const submitButton = (element: HTMLElement) =>
    [...element.querySelectorAll('button')].find((button) => button.textContent?.trim() === 'Sign in')!;

  it('dispatches Opened when shown', async () => {
    await render();

    expect(store.dispatch).toHaveBeenCalledWith(SignInPageActions.opened());
  });

  it('dispatches Submitted with the trimmed credentials and the return address on submit', async () => {
    const element = await render();
    fill(element, 'email', '  priya.raman@fernhollow.example ');
    fill(element, 'password', 'correct horse battery');

    submitButton(element).click();
    await fixture.whenStable();

    expect(store.dispatch).toHaveBeenCalledWith(
      SignInPageActions.submitted({
        credentials: { email: 'priya.raman@fernhollow.example', password: 'correct horse battery' },
        returnUrl: '/members',
      }),
    );
  });

  it('shows an error at the e-mail field and dispatches nothing when the e-mail is malformed', async () => {
    const element = await render();
    fill(element, 'email', 'not-an-address');
    fill(element, 'password', 'whatever');

    submitButton(element).click();
    await fixture.whenStable();

    expect(element.querySelector('mat-error')?.textContent).toContain('This does not look like an e-mail address.');
    expect(store.dispatch).not.toHaveBeenCalledWith(expect.objectContaining({ type: SignInPageActions.submitted.type }));
  });

  it('ignores a second submit while the first sign-in is on its way, keeping the button usable', async () => {
    const element = await render({ signingIn: true });
    fill(element, 'email', 'priya.raman@fernhollow.example');
    fill(element, 'password', 'correct horse battery');

    submitButton(element).click();
    await fixture.whenStable();

    expect(submitButton(element).disabled).toBe(false);
    expect(store.dispatch).not.toHaveBeenCalledWith(expect.objectContaining({ type: SignInPageActions.submitted.type }));
  });

  it('shows the refusal from the server and the wait it asks for', async () => {
    const element = await render({ signInError: 'Too many attempts.', retryAfterSeconds: 300 });

    expect(element.querySelector('[role="alert"]')?.textContent).toMatch(/Too many attempts\.\s+You can try again in about 5 minutes\./);
  });

  it('shows the reason the server gave for a field at that field', async () => {
    const element = await render();
    fill(element, 'email', 'priya@fernhollow');
    fill(element, 'password', 'correct horse battery');

    store.overrideSelector(authFeature.selectSignInFieldErrors, { email: 'Give a full e-mail address.' });
    store.refreshState();
    await fixture.whenStable();

    expect(element.querySelector('mat-error')?.textContent).toContain('Give a full e-mail address.');
  });

  it('updates the shown refusal when the store changes', async () => {
    const element = await render();

    store.overrideSelector(authFeature.selectSignInError, 'E-mail or password is wrong.');
    store.refreshState();
    await fixture.whenStable();

    expect(element.querySelector('[role="alert"]')?.textContent).toContain('E-mail or password is wrong.');
  });

  it('links to the forgotten-password page', async () => {
    const element = await render();

    const link = [...element.querySelectorAll('a')].find((a) => a.textContent?.includes('Forgot your password?'));
    expect(link?.getAttribute('href')).toBe('/forgot-password');
  });
});
