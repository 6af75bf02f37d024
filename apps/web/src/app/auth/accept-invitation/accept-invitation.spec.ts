import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';

import { TeamStore } from '../../teams/team-store';
import { AcceptInvitation } from './accept-invitation';

const TEAM_ID = '7b0f3c1e-0000-4000-8000-000000000002';

describe('AcceptInvitation', () => {
  let fixture: ComponentFixture<AcceptInvitation>;
  let httpTesting: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [AcceptInvitation],
      providers: [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    fixture = TestBed.createComponent(AcceptInvitation);
    httpTesting = TestBed.inject(HttpTestingController);
  });

  afterEach(() => httpTesting.verify());

  function element(): HTMLElement {
    return fixture.nativeElement as HTMLElement;
  }

  function acceptButton(): HTMLButtonElement | undefined {
    return [...element().querySelectorAll('button')].find((button) => button.textContent?.includes('Accept invitation'));
  }

  it('joins the team, refreshes the team list and opens the team', async () => {
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    fixture.componentRef.setInput('token', 'tok-1');
    await fixture.whenStable();

    acceptButton()?.click();
    const accept = httpTesting.expectOne('/api/invitations/accept');
    expect(accept.request.body).toEqual({ token: 'tok-1' });
    accept.flush({ teamId: TEAM_ID, teamName: 'Ironbark Creek', role: 'viewer' });
    httpTesting.expectOne('/api/teams').flush([{ id: TEAM_ID, name: 'Ironbark Creek', role: 'viewer' }]);
    await fixture.whenStable();

    expect(TestBed.inject(TeamStore).teams()?.map((team) => team.name)).toEqual(['Ironbark Creek']);
    expect(navigate).toHaveBeenCalledWith(['/teams', TEAM_ID]);
  });

  it('explains an expired invitation on the page', async () => {
    fixture.componentRef.setInput('token', 'tok-old');
    await fixture.whenStable();

    acceptButton()?.click();
    httpTesting.expectOne('/api/invitations/accept').flush(
      { type: 'urn:x', title: 'Gone', status: 410, detail: 'Expired.', code: 'INVITATION_EXPIRED' },
      { status: 410, statusText: 'Gone' },
    );
    await fixture.whenStable();

    expect(element().querySelector('[role="alert"]')?.textContent).toContain('This invitation has expired.');
  });

  it('offers no button for a link without token', async () => {
    await fixture.whenStable();

    expect(acceptButton()).toBeUndefined();
    expect(element().textContent).toContain('This link has no invitation token.');
  });
});
