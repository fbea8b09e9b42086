import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { User } from '../../../../shared/contracts/auth';
import { AuthState } from '../../core/auth/auth-state';
import { SignIn } from './sign-in';

async function renderSignIn(returnUrl?: string) {
  TestBed.configureTestingModule({
    imports: [SignIn],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const http = TestBed.inject(HttpTestingController);
  // The visitor is signed out: the shell's first session look-up answered 401.
  const sessionKnown = TestBed.inject(AuthState).ready();
  http.expectOne('/api/auth/me').flush(null, { status: 401, statusText: 'Unauthorized' });
  await sessionKnown;
  const fixture = TestBed.createComponent(SignIn);
  if (returnUrl) fixture.componentRef.setInput('returnUrl', returnUrl);
  await fixture.whenStable();
  const root = fixture.nativeElement as HTMLElement;
  const router = TestBed.inject(Router);
  return { fixture, root, http, router };
}

function type(root: HTMLElement, selector: string, value: string): void {
  const input = root.querySelector<HTMLInputElement>(selector);
  if (!input) throw new Error(`No input ${selector} in the sign-in form.`);
  input.value = value;
  input.dispatchEvent(new Event('input'));
  input.dispatchEvent(new Event('blur'));
}

function submit(root: HTMLElement): void {
  root.querySelector<HTMLFormElement>('form')?.dispatchEvent(new Event('submit'));
}

const signedInUser: User = {
  id: 'u-1',
  name: 'Ada Rivers',
  email: 'ada@example.org',
  role: 'admin',
  units: 'metric',
};

/** Lets `submit()` reach its HTTP call once the session look-up has settled. */
const settle = () => new Promise((resolve) => setTimeout(resolve));

describe('SignIn', () => {
  it('shows the product name and both fields', async () => {
    const { root } = await renderSignIn();
    expect(root.querySelector('h1')?.textContent).toBe('Tidewright');
    expect(root.querySelector('input[type=email]')).not.toBeNull();
    expect(root.querySelector('input[type=password]')).not.toBeNull();
  });

  it('shows a field error for an invalid e-mail and sends nothing', async () => {
    const { fixture, root, http } = await renderSignIn();
    type(root, 'input[type=email]', 'not-an-address');
    type(root, 'input[type=password]', 'secret-pass');
    submit(root);
    await fixture.whenStable();
    const errors = [...root.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
    expect(errors).toEqual(['Enter an e-mail address in the form name@example.org.']);
    http.expectNone('/api/auth/login');
  });

  it('asks for both fields when the form is sent empty', async () => {
    const { fixture, root } = await renderSignIn();
    submit(root);
    await fixture.whenStable();
    const errors = [...root.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
    expect(errors).toEqual(['Enter the e-mail address of your account.', 'Enter your password.']);
  });

  it("shows the server's message when the password is refused", async () => {
    const { root, http } = await renderSignIn();
    type(root, 'input[type=email]', 'ada@example.org');
    type(root, 'input[type=password]', 'wrong-pass');
    submit(root);
    await settle();
    const login = http.expectOne('/api/auth/login');
    expect(login.request.body).toEqual({ email: 'ada@example.org', password: 'wrong-pass' });
    login.flush(
      { error: { code: 'BAD_CREDENTIALS', message: 'E-mail or password is not right.' } },
      { status: 401, statusText: 'Unauthorized' },
    );
    await vi.waitFor(() =>
      expect(root.querySelector('[role=alert]')?.textContent).toContain(
        'E-mail or password is not right.',
      ),
    );
  });

  it('says the server did not answer when the network fails', async () => {
    const { root, http } = await renderSignIn();
    type(root, 'input[type=email]', 'ada@example.org');
    type(root, 'input[type=password]', 'any-pass');
    submit(root);
    await settle();
    http.expectOne('/api/auth/login').error(new ProgressEvent('error'), { status: 0 });
    await vi.waitFor(() =>
      expect(root.querySelector('[role=alert]')?.textContent).toContain('server did not answer'),
    );
  });

  it('signs in and goes to the return URL', async () => {
    const { root, http, router } = await renderSignIn('/admin/users');
    const navigate = vi.spyOn(router, 'navigateByUrl').mockResolvedValue(true);
    type(root, 'input[type=email]', 'ada@example.org');
    type(root, 'input[type=password]', 'right-pass');
    submit(root);
    await settle();
    http.expectOne('/api/auth/login').flush({ user: signedInUser });
    await vi.waitFor(() => expect(navigate).toHaveBeenCalledWith('/admin/users'));
    expect(TestBed.inject(AuthState).user()).toEqual(signedInUser);
  });

  it('ignores a return URL that leaves the site', async () => {
    const { root, http, router } = await renderSignIn('//elsewhere.example/steal');
    const navigate = vi.spyOn(router, 'navigateByUrl').mockResolvedValue(true);
    type(root, 'input[type=email]', 'ada@example.org');
    type(root, 'input[type=password]', 'right-pass');
    submit(root);
    await settle();
    http.expectOne('/api/auth/login').flush({ user: signedInUser });
    await vi.waitFor(() => expect(navigate).toHaveBeenCalledWith('/systems'));
  });
});
