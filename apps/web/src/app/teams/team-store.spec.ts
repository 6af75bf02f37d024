import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import { AuthStore } from '../auth/auth-store';
import { TeamStore } from './team-store';

const user = (name: string) => ({ id: `u-${name}`, email: `${name}@example.org`, displayName: name });

describe('TeamStore', () => {
  let store: TeamStore;
  let authStore: AuthStore;
  let httpTesting: HttpTestingController;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting()],
    });
    store = TestBed.inject(TeamStore);
    authStore = TestBed.inject(AuthStore);
    httpTesting = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    httpTesting.verify();
    localStorage.clear();
  });

  function signIn(name: string): void {
    authStore.signIn({ email: `${name}@example.org`, password: 'password-long' }).subscribe();
    httpTesting.expectOne('/api/auth/login').flush({ token: `jwt-${name}`, user: user(name) });
  }

  it('sorts teams by name and adds a new team in place', () => {
    signIn('ana');
    store.load().subscribe();
    httpTesting.expectOne('/api/teams').flush([
      { id: 't2', name: 'Kestrel Flats', role: 'editor' },
      { id: 't1', name: 'Ironbark Creek', role: 'owner' },
    ]);
    store.create('Jarrah Pit').subscribe();
    httpTesting.expectOne('/api/teams').flush({ id: 't3', name: 'Jarrah Pit', role: 'owner' }, { status: 201, statusText: 'Created' });

    expect(store.teams()?.map((team) => team.name)).toEqual(['Ironbark Creek', 'Jarrah Pit', 'Kestrel Flats']);
  });

  it('never shows one session’s teams to the next', () => {
    signIn('ana');
    store.load().subscribe();
    httpTesting.expectOne('/api/teams').flush([{ id: 't1', name: 'Ironbark Creek', role: 'owner' }]);
    store.select('t1');
    expect(store.isOwner()).toBe(true);

    authStore.clearSession();
    signIn('ben');

    expect(store.teams()).toBeNull();
    expect(store.currentTeam()).toBeNull();
    store.ensureLoaded().subscribe();
    httpTesting.expectOne('/api/teams').flush([]);
    expect(store.teams()).toEqual([]);
  });

  it.each([
    { role: 'owner', isOwner: true, isReviewer: true, canWrite: true },
    { role: 'reviewer', isOwner: false, isReviewer: true, canWrite: true },
    { role: 'editor', isOwner: false, isReviewer: false, canWrite: true },
    { role: 'viewer', isOwner: false, isReviewer: false, canWrite: false },
  ])('gives the rights of a $role in the current team', ({ role, isOwner, isReviewer, canWrite }) => {
    signIn('ana');
    store.load().subscribe();
    httpTesting.expectOne('/api/teams').flush([{ id: 't1', name: 'Ironbark Creek', role }]);
    store.select('t1');

    expect({ isOwner: store.isOwner(), isReviewer: store.isReviewer(), canWrite: store.canWrite() }).toEqual({ isOwner, isReviewer, canWrite });
  });

  it('opens the team used last, else the first', () => {
    signIn('ana');
    store.load().subscribe();
    httpTesting.expectOne('/api/teams').flush([
      { id: 't1', name: 'A team', role: 'owner' },
      { id: 't2', name: 'B team', role: 'viewer' },
    ]);
    expect(store.preferredTeam()?.id).toBe('t1');

    store.select('t2');

    expect(store.preferredTeam()?.id).toBe('t2');
  });
});
