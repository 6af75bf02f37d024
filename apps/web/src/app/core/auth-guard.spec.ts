import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Component } from '@angular/core';
import { Router, provideRouter } from '@angular/router';

import { TOKEN_STORAGE_KEY } from '../auth/auth-store';
import { safeReturnUrl, signedInGuard, signedOutGuard } from './auth-guard';

@Component({ template: 'page' })
class Page {}

describe('signedInGuard and signedOutGuard', () => {
  function setUp(token: string | null): Router {
    localStorage.clear();
    if (token !== null) {
      localStorage.setItem(TOKEN_STORAGE_KEY, token);
    }
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([
          { path: 'sign-in', canMatch: [signedOutGuard], component: Page },
          { path: '', canMatch: [signedInGuard], children: [{ path: '**', component: Page }] },
        ]),
      ],
    });
    return TestBed.inject(Router);
  }

  afterEach(() => localStorage.clear());

  it('sends a signed-out visitor of an invitation link to sign-in, keeping the whole link', async () => {
    const router = setUp(null);

    await router.navigateByUrl('/invitations/accept?token=abc');

    expect(router.url).toBe('/sign-in?returnUrl=%2Finvitations%2Faccept%3Ftoken%3Dabc');
  });

  it('lets a signed-in user through', async () => {
    const router = setUp('token');

    await router.navigateByUrl('/teams/t1/members');

    expect(router.url).toBe('/teams/t1/members');
  });

  it('keeps a signed-in user away from sign-in', async () => {
    const router = setUp('token');

    await router.navigateByUrl('/sign-in');

    expect(router.url).toBe('/');
  });
});

describe('safeReturnUrl', () => {
  it.each([
    { input: '/teams/1/members', output: '/teams/1/members' },
    { input: '/invitations/accept?token=x', output: '/invitations/accept?token=x' },
    { input: undefined, output: '/' },
    { input: 'https://evil.example', output: '/' },
    { input: '//evil.example', output: '/' },
    { input: '/\\evil.example', output: '/' },
  ])('turns $input into $output', ({ input, output }) => {
    expect(safeReturnUrl(input)).toBe(output);
  });
});
