import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import { ChangePasswordRequest, Profile, PROFILE_PATH, UpdateProfileRequest } from '@shared/profile';

/** Typed calls to the signed-in person's own account. */
@Injectable({ providedIn: 'root' })
export class ProfileClient {
  private readonly http = inject(HttpClient);

  load(): Observable<Profile> {
    return this.http.get<Profile>(PROFILE_PATH);
  }

  update(request: UpdateProfileRequest): Observable<Profile> {
    return this.http.put<Profile>(PROFILE_PATH, request);
  }

  changePassword(request: ChangePasswordRequest): Observable<void> {
    return this.http.put<void>(`${PROFILE_PATH}/password`, request);
  }
}
