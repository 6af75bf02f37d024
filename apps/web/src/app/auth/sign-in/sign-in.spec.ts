import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router, provideRouter } from '@angular/router';

import { AuthStore, TOKEN_STORAGE_KEY } from '../auth-store';
import { SignIn } from './sign-in';

describe('SignIn', () => {
  let fixture: ComponentFixture<SignIn>;
  let loader: HarnessLoader;
  let httpTesting: HttpTestingController;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [SignIn],
      providers: [provideZonelessChangeDetection(), provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
    });
    fixture = TestBed.createComponent(SignIn);
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

  async function fill(label: string, value: string): Promise<void> {
    const input = await (await field(label)).getControl(MatInputHarness);
    await input?.setValue(value);
  }

  async function submit(): Promise<void> {
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Sign in' }))).click();
    await fixture.whenStable();
  }

  it('shows what is missing at each field and sends nothing', async () => {
    await submit();

    expect(await (await field('E-mail')).getTextErrors()).toEqual(['Required.']);
    expect(await (await field('Password')).getTextErrors()).toEqual(['Required.']);
  });

  it('refuses a malformed e-mail address at its field', async () => {
    await fill('E-mail', 'not-an-address');
    await fill('Password', 'secret-password');
    await submit();

    expect(await (await field('E-mail')).getTextErrors()).toEqual([
      'Enter an e-mail address such as name@example.org.',
    ]);
  });

  it('says so when e-mail or password is wrong', async () => {
    await fill('E-mail', 'ana@example.org');
    await fill('Password', 'wrong-password');
    await submit();

    httpTesting.expectOne('/api/auth/login').flush(
      { type: 'about:blank', title: 'Unauthorized', status: 401, detail: 'Wrong', code: 'AUTH_INVALID_CREDENTIALS' },
      { status: 401, statusText: 'Unauthorized' },
    );
    await fixture.whenStable();

    const alert = (fixture.nativeElement as HTMLElement).querySelector('[role="alert"]');
    expect(alert?.textContent).toContain('E-mail or password is wrong.');
    expect(TestBed.inject(AuthStore).isSignedIn()).toBe(false);
  });

  it('keeps the session and returns to the page the user wanted', async () => {
    const navigateByUrl = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    fixture.componentRef.setInput('returnUrl', '/invitations/accept?token=t1');
    await fill('E-mail', 'ana@example.org');
    await fill('Password', 'right-password');
    await submit();

    const request = httpTesting.expectOne('/api/auth/login');
    expect(request.request.body).toEqual({ email: 'ana@example.org', password: 'right-password' });
    request.flush({ token: 'jwt-1', user: { id: 'u1', email: 'ana@example.org', displayName: 'Ana' } });
    await fixture.whenStable();

    expect(localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('jwt-1');
    expect(TestBed.inject(AuthStore).user()?.displayName).toBe('Ana');
    expect(navigateByUrl).toHaveBeenCalledWith('/invitations/accept?token=t1');
  });
});
