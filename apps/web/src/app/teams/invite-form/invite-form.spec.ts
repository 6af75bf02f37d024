import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';

import { MembersStore } from '../members/members-store';
import { InviteForm } from './invite-form';

const TEAM_ID = '7b0f3c1e-0000-4000-8000-000000000001';

describe('InviteForm', () => {
  let fixture: ComponentFixture<InviteForm>;
  let loader: HarnessLoader;
  let httpTesting: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [InviteForm],
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), MembersStore],
    });
    fixture = TestBed.createComponent(InviteForm);
    fixture.componentRef.setInput('teamId', TEAM_ID);
    loader = TestbedHarnessEnvironment.loader(fixture);
    httpTesting = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
  });

  afterEach(() => httpTesting.verify());

  async function emailField(): Promise<MatFormFieldHarness> {
    return loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'E-mail' }));
  }

  async function invite(email: string, role: RegExp): Promise<void> {
    await (await (await emailField()).getControl(MatInputHarness))?.setValue(email);
    const select = await loader.getHarness(MatSelectHarness);
    await select.open();
    await select.clickOptions({ text: role });
    await (await loader.getHarness(MatButtonHarness.with({ text: /Send invitation/ }))).click();
    await fixture.whenStable();
  }

  it('sends the invitation with the chosen role and clears the address', async () => {
    await invite('cleo@example.org', /Reviewer/);

    const request = httpTesting.expectOne(`/api/teams/${TEAM_ID}/invitations`);
    expect(request.request.body).toEqual({ email: 'cleo@example.org', role: 'reviewer' });
    request.flush(
      { id: 'i1', email: 'cleo@example.org', role: 'reviewer', createdAt: '2026-03-01T10:00:00Z', expiresAt: '2026-03-08T10:00:00Z' },
      { status: 201, statusText: 'Created' },
    );
    await fixture.whenStable();

    expect(TestBed.inject(MembersStore).invitations()?.map((invitation) => invitation.email)).toEqual(['cleo@example.org']);
    expect(await (await (await emailField()).getControl(MatInputHarness))?.getValue()).toBe('');
    expect(await (await emailField()).hasErrors()).toBe(false);
  });

  it('shows at the address field that the person is a member already', async () => {
    await invite('ana@example.org', /Editor/);

    httpTesting.expectOne(`/api/teams/${TEAM_ID}/invitations`).flush(
      { type: 'urn:x', title: 'Conflict', status: 409, detail: 'Already a member.', code: 'INVITATION_ALREADY_MEMBER' },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();

    expect(await (await emailField()).getTextErrors()).toEqual(['This person is a member of the team already.']);
  });
});
