import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import {
  AcceptInvitationRequest,
  AUTH_PATH,
  CompletePasswordResetRequest,
  INVITATIONS_PATH,
  InvitationPreview,
  PASSWORD_RESETS_PATH,
  PasswordResetRequest,
  SessionProbeResponse,
  SessionResponse,
  SignInRequest,
} from '@shared/auth';
import { Observable } from 'rxjs';

/** The session probe's address; the API error interceptor lets its answers through untouched. */
export const SESSION_URL = `${AUTH_PATH}/session`;

/** Typed calls to the sign-in, invitation and password-reset routes. */
@Injectable({ providedIn: 'root' })
export class AuthClient {
  private readonly http = inject(HttpClient);

  session(): Observable<SessionProbeResponse> {
    return this.http.get<SessionProbeResponse>(SESSION_URL);
  }

  signIn(request: SignInRequest): Observable<SessionResponse> {
    return this.http.post<SessionResponse>(`${AUTH_PATH}/sign-in`, request);
  }

  signOut(): Observable<void> {
    return this.http.post<void>(`${AUTH_PATH}/sign-out`, null);
  }

  invitation(token: string): Observable<InvitationPreview> {
    return this.http.get<InvitationPreview>(`${INVITATIONS_PATH}/${encodeURIComponent(token)}`);
  }

  acceptInvitation(token: string, request: AcceptInvitationRequest): Observable<SessionResponse> {
    return this.http.post<SessionResponse>(`${INVITATIONS_PATH}/${encodeURIComponent(token)}/acceptance`, request);
  }

  requestPasswordReset(request: PasswordResetRequest): Observable<void> {
    return this.http.post<void>(`${PASSWORD_RESETS_PATH}/requests`, request);
  }

  completePasswordReset(request: CompletePasswordResetRequest): Observable<void> {
    return this.http.post<void>(PASSWORD_RESETS_PATH, request);
  }
}
