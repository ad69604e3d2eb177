import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { INVITATIONS_PATH } from '@shared/auth';
import {
  CreateInvitationRequest,
  Invitation,
  IssuedPasswordReset,
  Member,
  MemberListResponse,
  MEMBERS_PATH,
  UpdateMemberRequest,
} from '@shared/members';
import { Observable } from 'rxjs';

/** Typed calls to the admin routes for members and invitations. */
@Injectable({ providedIn: 'root' })
export class MembersClient {
  private readonly http = inject(HttpClient);

  list(): Observable<MemberListResponse> {
    return this.http.get<MemberListResponse>(MEMBERS_PATH);
  }

  update(memberId: number, request: UpdateMemberRequest): Observable<Member> {
    return this.http.patch<Member>(`${MEMBERS_PATH}/${memberId}`, request);
  }

  issuePasswordReset(memberId: number): Observable<IssuedPasswordReset> {
    return this.http.post<IssuedPasswordReset>(`${MEMBERS_PATH}/${memberId}/password-reset`, null);
  }

  invite(request: CreateInvitationRequest): Observable<Invitation> {
    return this.http.post<Invitation>(INVITATIONS_PATH, request);
  }

  revokeInvitation(invitationId: number): Observable<void> {
    return this.http.delete<void>(`${INVITATIONS_PATH}/${invitationId}`);
  }
}
