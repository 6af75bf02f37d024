import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { provideRouter } from '@angular/router';

import { Register } from './register';

describe('Register', () => {
  let fixture: ComponentFixture<Register>;
  let loader: HarnessLoader;
  let httpTesting: HttpTestingController;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Register],
      providers: [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    fixture = TestBed.createComponent(Register);
    loader = TestbedHarnessEnvironment.loader(fixture);
    httpTesting = TestBed.inject(HttpTestingController);
    await fixture.whenStable();
  });

  afterEach(() => {
    httpTesting.verify();
    localStorage.clear();
  });

  async function field(label: string): Promise<MatFormFieldHarness> {
    return loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  }

  async function fillAndSubmit(values: { name: string; email: string; password: string }): Promise<void> {
    await (await (await field('Display name')).getControl(MatInputHarness))?.setValue(values.name);
    await (await (await field('E-mail')).getControl(MatInputHarness))?.setValue(values.email);
    await (await (await field('Password')).getControl(MatInputHarness))?.setValue(values.password);
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Create account' }))).click();
    await fixture.whenStable();
  }

  it('asks for a longer password before calling the API', async () => {
    await fillAndSubmit({ name: 'Ana', email: 'ana@example.org', password: 'short' });

    expect(await (await field('Password')).getTextErrors()).toEqual(['Use at least 10 characters.']);
  });

  it('shows at the e-mail field that the address has an account', async () => {
    await fillAndSubmit({ name: 'Ana', email: 'ana@example.org', password: 'long-enough-password' });

    httpTesting.expectOne('/api/auth/register').flush(
      { type: 'urn:x', title: 'Conflict', status: 409, detail: 'Taken.', code: 'AUTH_EMAIL_TAKEN' },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();

    expect(await (await field('E-mail')).getTextErrors()).toEqual([
      'An account with this e-mail exists already. Sign in instead.',
    ]);
  });

  it('shows the API’s field issues at their fields', async () => {
    await fillAndSubmit({ name: 'Ana', email: 'ana@example.org', password: 'long-enough-password' });

    httpTesting.expectOne('/api/auth/register').flush(
      {
        type: 'urn:x',
        title: 'Invalid request',
        status: 400,
        detail: 'The request has 1 invalid field.',
        code: 'REQUEST_INVALID',
        issues: [{ code: 'custom', message: 'Password must be at most 72 bytes in UTF-8', path: ['password'] }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();

    expect(await (await field('Password')).getTextErrors()).toEqual(['Password must be at most 72 bytes in UTF-8']);
  });
});
