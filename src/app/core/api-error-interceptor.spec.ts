import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MockStore, provideMockStore } from '@ngrx/store/testing';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { apiErrorInterceptor } from './api-error-interceptor';

describe('apiErrorInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let store: MockStore;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideMockStore(),
        provideHttpClient(withInterceptors([apiErrorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    store = TestBed.inject(MockStore);
    jest.spyOn(store, 'dispatch');
  });

  afterEach(() => backend.verify());

  function answer401(url: string, code: string): void {
    http.get(url).subscribe({ error: () => undefined });
    backend.expectOne(url).flush({ error: { code, message: 'No.' } }, { status: 401, statusText: 'Unauthorized' });
  }

  it('dispatches Session Expired on a 401 not-signed-in from an API route', () => {
    answer401('/api/members', 'not-signed-in');

    expect(store.dispatch).toHaveBeenCalledWith(AuthApiActions.sessionExpired());
  });

  it('leaves a 401 from the session probe alone', () => {
    answer401('/api/auth/session', 'not-signed-in');

    expect(store.dispatch).not.toHaveBeenCalled();
  });

  it('leaves a refused sign-in (invalid-credentials) alone', () => {
    answer401('/api/auth/sign-in', 'invalid-credentials');

    expect(store.dispatch).not.toHaveBeenCalled();
  });
});
