import { Injectable, computed, inject, signal } from '@angular/core';
import { Observable, tap } from 'rxjs';
import type { AuthSession, LoginRequest, RegisterRequest, User } from '@tallus/contracts';

import { AuthApi } from './auth-api';

/** Key of the session token in localStorage. */
export const TOKEN_STORAGE_KEY = 'tallus.token';

/**
 * The session: the bearer token (kept in localStorage so a reload stays signed in)
 * and the signed-in user.
 */
@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly api = inject(AuthApi);

  private readonly tokenState = signal<string | null>(readStoredToken());
  private readonly userState = signal<User | null>(null);

  /** The bearer token, or null when signed out. */
  readonly token = this.tokenState.asReadonly();
  /** The signed-in user, once sign-in or `GET /api/auth/me` told us. */
  readonly user = this.userState.asReadonly();
  /** Whether a session token is present. */
  readonly isSignedIn = computed(() => this.tokenState() !== null);

  /** Signs in and keeps the session. */
  signIn(request: LoginRequest): Observable<AuthSession> {
    return this.api.signIn(request).pipe(tap((response) => this.startSession(response)));
  }

  /** Creates an account and keeps its session. */
  register(request: RegisterRequest): Observable<AuthSession> {
    return this.api.register(request).pipe(tap((response) => this.startSession(response)));
  }

  /**
   * Records the user that `GET /api/auth/me` returned.
   *
   * @param user the signed-in user
   */
  setUser(user: User): void {
    this.userState.set(user);
  }

  /**
   * Ends the session. The server is told; the token is dropped here at once, so
   * signing out never depends on the network.
   */
  signOut(): void {
    if (this.tokenState() !== null) {
      // The interceptor reads the token when the request is sent, which happens
      // synchronously on subscribe, so the call still carries it. Its outcome does not matter.
      this.api.signOut().subscribe({ error: () => undefined });
    }
    this.clearSession();
  }

  /** Drops the token and user without calling the server (used when the server said 401). */
  clearSession(): void {
    localStorage.removeItem(TOKEN_STORAGE_KEY);
    this.tokenState.set(null);
    this.userState.set(null);
  }

  private startSession(response: AuthSession): void {
    localStorage.setItem(TOKEN_STORAGE_KEY, response.token);
    this.tokenState.set(response.token);
    this.userState.set(response.user);
  }
}

function readStoredToken(): string | null {
  try {
    return localStorage.getItem(TOKEN_STORAGE_KEY);
  } catch {
    // Storage can be disabled by the browser's privacy settings: start signed out.
    return null;
  }
}
