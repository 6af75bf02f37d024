import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';

import { AuthStore, TOKEN_STORAGE_KEY } from '../auth/auth-store';
import { authInterceptor } from './auth-interceptor';

describe('authInterceptor', () => {
  let http: HttpClient;
  let httpTesting: HttpTestingController;

  function setUp(token: string | null): void {
    localStorage.clear();
    if (token !== null) {
      localStorage.setItem(TOKEN_STORAGE_KEY, token);
    }
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    http = TestBed.inject(HttpClient);
    httpTesting = TestBed.inject(HttpTestingController);
  }

  afterEach(() => {
    httpTesting.verify();
    localStorage.clear();
  });

  it('adds the bearer token to API calls', () => {
    setUp('token-1');
    http.get('/api/teams').subscribe();

    expect(httpTesting.expectOne('/api/teams').request.headers.get('Authorization')).toBe('Bearer token-1');
  });

  it('sends no token to other addresses', () => {
    setUp('token-1');
    http.get('/fonts/tallus-fonts.css').subscribe();

    expect(httpTesting.expectOne('/fonts/tallus-fonts.css').request.headers.has('Authorization')).toBe(false);
  });

  it('ends the session and routes to sign-in when the API refuses the token', () => {
    setUp('expired-token');
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    let status = 0;
    http.get('/api/auth/me').subscribe({ error: (error: { status: number }) => (status = error.status) });

    httpTesting.expectOne('/api/auth/me').flush({ code: 'AUTH_INVALID_TOKEN' }, { status: 401, statusText: 'Unauthorized' });

    expect(status).toBe(401);
    expect(TestBed.inject(AuthStore).isSignedIn()).toBe(false);
    expect(localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], expect.anything());
  });

  it('leaves a 401 without token (wrong password) to the caller', () => {
    setUp(null);
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate');
    http.post('/api/auth/login', {}).subscribe({ error: () => undefined });

    const request = httpTesting.expectOne('/api/auth/login');
    expect(request.request.headers.has('Authorization')).toBe(false);
    request.flush({ code: 'AUTH_INVALID_CREDENTIALS' }, { status: 401, statusText: 'Unauthorized' });

    expect(navigate).not.toHaveBeenCalled();
  });
});
