import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MembersClient } from './members-client';

describe('MembersClient', () => {
  let client: MembersClient;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    client = TestBed.inject(MembersClient);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('update sends a PATCH with only the changed fields to /api/members/:memberId', () => {
    client.update(7, { active: false }).subscribe();

    const request = backend.expectOne('/api/members/7');
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ active: false });
    request.flush({});
  });

  it('revokeInvitation sends a DELETE to /api/invitations/:invitationId', () => {
    client.revokeInvitation(3).subscribe();

    const request = backend.expectOne('/api/invitations/3');
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
  });

  it('issuePasswordReset posts to /api/members/:memberId/password-reset', () => {
    client.issuePasswordReset(9).subscribe();

    const request = backend.expectOne('/api/members/9/password-reset');
    expect(request.request.method).toBe('POST');
    request.flush({ link: 'https://coop.example/reset-password/abc', expiresAt: '2026-12-02T10:00:00Z' });
  });
});
