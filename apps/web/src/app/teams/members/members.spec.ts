import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import type { Member, Role } from '@tallus/contracts';

import { AuthStore } from '../../auth/auth-store';
import { TeamStore } from '../team-store';
import { Members } from './members';

const TEAM_ID = '7b0f3c1e-0000-4000-8000-000000000001';
const ana: Member = { userId: 'u-ana', email: 'ana@example.org', displayName: 'Ana Owner', role: 'owner', joinedAt: '2026-01-05T10:00:00Z' };
const ben: Member = { userId: 'u-ben', email: 'ben@example.org', displayName: 'Ben Editor', role: 'editor', joinedAt: '2026-02-01T10:00:00Z' };

describe('Members', () => {
  let fixture: ComponentFixture<Members>;
  let loader: HarnessLoader;
  let httpTesting: HttpTestingController;

  async function open(role: Role): Promise<void> {
    TestBed.configureTestingModule({
      imports: [Members],
      providers: [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    httpTesting = TestBed.inject(HttpTestingController);
    TestBed.inject(AuthStore).setUser({ id: ana.userId, email: ana.email, displayName: ana.displayName });
    const teamStore = TestBed.inject(TeamStore);
    teamStore.load().subscribe();
    httpTesting.expectOne('/api/teams').flush([{ id: TEAM_ID, name: 'Kestrel Flats', role }]);
    teamStore.select(TEAM_ID);

    fixture = TestBed.createComponent(Members);
    fixture.componentRef.setInput('teamId', TEAM_ID);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
    httpTesting.expectOne(`/api/teams/${TEAM_ID}/members`).flush([ana, ben]);
    if (role === 'owner') {
      httpTesting.expectOne(`/api/teams/${TEAM_ID}/invitations`).flush([]);
    }
    await fixture.whenStable();
  }

  afterEach(() => {
    httpTesting.verify();
    localStorage.clear();
  });

  function text(): string {
    return (fixture.nativeElement as HTMLElement).textContent ?? '';
  }

  async function roleSelectOf(member: Member): Promise<MatSelectHarness> {
    return loader.getHarness(MatSelectHarness.with({ selector: `[aria-label="Permissions of ${member.displayName}"]` }));
  }

  it('lets an owner change a member’s role', async () => {
    await open('owner');
    const select = await roleSelectOf(ben);

    await select.open();
    await select.clickOptions({ text: /Reviewer/ });
    const request = httpTesting.expectOne(`/api/teams/${TEAM_ID}/members/${ben.userId}`);
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ role: 'reviewer' });
    request.flush({ ...ben, role: 'reviewer' });
    await fixture.whenStable();

    expect(await select.getValueText()).toContain('Reviewer');
  });

  it('explains the last-owner refusal and shows the real role again', async () => {
    await open('owner');
    const select = await roleSelectOf(ana);

    await select.open();
    await select.clickOptions({ text: /Viewer/ });
    httpTesting.expectOne(`/api/teams/${TEAM_ID}/members/${ana.userId}`).flush(
      {
        type: 'urn:tallus:problem:team-last-owner',
        title: 'Conflict',
        status: 409,
        detail: 'Ana Owner is the last owner of Kestrel Flats.',
        code: 'TEAM_LAST_OWNER',
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();

    const alert = (fixture.nativeElement as HTMLElement).querySelector('[role="alert"]');
    expect(alert?.textContent).toContain('Ana Owner stays owner.');
    expect(alert?.textContent).toContain('A team needs at least one owner');
    expect(await select.getValueText()).toContain('Owner');
  });

  it('shows owners the empty invitation list with what to do', async () => {
    await open('owner');

    expect(text()).toContain('No pending invitations');
  });

  it('shows everyone else the list read-only', async () => {
    await open('viewer');

    expect(await loader.getAllHarnesses(MatSelectHarness)).toHaveLength(0);
    expect(text()).toContain('Ben Editor');
    expect(text()).toContain('Editor');
    expect(text()).not.toContain('Pending invitations');
    expect(text()).not.toContain('Send invitation');
  });
});
