import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';

import { authInterceptor } from '../core/auth-interceptor';
import { AuthStore, TOKEN_STORAGE_KEY } from './auth-store';

describe('AuthStore', () => {
  let store: AuthStore;
  let httpTesting: HttpTestingController;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    store = TestBed.inject(AuthStore);
    httpTesting = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    httpTesting.verify();
    localStorage.clear();
  });

  it('keeps the session of a new account', () => {
    store.register({ email: 'ana@example.org', password: 'long-enough-1', displayName: 'Ana' }).subscribe();
    httpTesting
      .expectOne('/api/auth/register')
      .flush({ token: 'jwt-new', user: { id: 'u1', email: 'ana@example.org', displayName: 'Ana' } }, { status: 201, statusText: 'Created' });

    expect(store.isSignedIn()).toBe(true);
    expect(store.user()?.email).toBe('ana@example.org');
    expect(localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('jwt-new');
  });

  it('tells the server on sign-out, with the token, and forgets the session at once', () => {
    localStorage.setItem(TOKEN_STORAGE_KEY, 'jwt-old');
    TestBed.resetTestingModule();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    store = TestBed.inject(AuthStore);
    httpTesting = TestBed.inject(HttpTestingController);

    store.signOut();

    const logout = httpTesting.expectOne('/api/auth/logout');
    expect(logout.request.headers.get('Authorization')).toBe('Bearer jwt-old');
    expect(store.isSignedIn()).toBe(false);
    expect(localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
    logout.flush(null, { status: 204, statusText: 'No Content' });
  });
});
