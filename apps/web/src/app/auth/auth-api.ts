import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  AcceptInvitationResponse,
  AuthSession,
  LoginRequest,
  MeResponse,
  RegisterRequest,
} from '@tallus/contracts';

/** Calls of `/api/auth` and of invitation acceptance. */
@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);

  /** Creates an account and signs it in. */
  register(request: RegisterRequest): Observable<AuthSession> {
    return this.http.post<AuthSession>('/api/auth/register', request);
  }

  /** Signs in; 401 for a wrong e-mail or password, 429 after too many attempts. */
  signIn(request: LoginRequest): Observable<AuthSession> {
    return this.http.post<AuthSession>('/api/auth/login', request);
  }

  /** Ends the session on the server. */
  signOut(): Observable<void> {
    return this.http.post<void>('/api/auth/logout', null);
  }

  /** The signed-in user and the teams they belong to. */
  me(): Observable<MeResponse> {
    return this.http.get<MeResponse>('/api/auth/me');
  }

  /**
   * Accepts an invitation for the signed-in user.
   *
   * @param token the token from the invitation e-mail's link
   */
  acceptInvitation(token: string): Observable<AcceptInvitationResponse> {
    return this.http.post<AcceptInvitationResponse>('/api/invitations/accept', { token });
  }
}
