import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { User } from '../../../../shared/contracts/auth';
import { Register } from './register';

async function renderRegister() {
  TestBed.configureTestingModule({
    imports: [Register],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(Register);
  await fixture.whenStable();
  return {
    fixture,
    root: fixture.nativeElement as HTMLElement,
    http: TestBed.inject(HttpTestingController),
  };
}

function type(root: HTMLElement, selector: string, value: string): void {
  const input = root.querySelector<HTMLInputElement>(selector);
  if (!input) throw new Error(`No input ${selector} in the register form.`);
  input.value = value;
  input.dispatchEvent(new Event('input'));
  input.dispatchEvent(new Event('blur'));
}

const errorsOf = (root: HTMLElement) =>
  [...root.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
const settle = () => new Promise((resolve) => setTimeout(resolve));
const newUser: User = {
  id: 'u-9',
  name: 'Rowan Reed',
  email: 'rowan@example.org',
  role: 'member',
  units: 'metric',
};

describe('Register', () => {
  it('checks the password with the shared rule before sending anything', async () => {
    const { fixture, root, http } = await renderRegister();
    type(root, 'input[formcontrolname=name]', 'Rowan Reed');
    type(root, 'input[type=email]', 'rowan@example.org');
    type(root, 'input[formcontrolname=password]', 'aaaaaaaaaaaa');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    await fixture.whenStable();
    expect(errorsOf(root)).toEqual(['Use at least 5 different characters.']);
    http.expectNone('/api/auth/register');
  });

  it('puts a taken address on the e-mail field', async () => {
    const { fixture, root, http } = await renderRegister();
    type(root, 'input[formcontrolname=name]', 'Rowan Reed');
    type(root, 'input[type=email]', 'rowan@example.org');
    type(root, 'input[formcontrolname=password]', 'gravel beds drain fast');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    http
      .expectOne('/api/auth/register')
      .flush(
        { error: { code: 'EMAIL_TAKEN', message: 'An account already uses that e-mail address.' } },
        { status: 409, statusText: 'Conflict' },
      );
    await settle();
    await fixture.whenStable();
    expect(errorsOf(root)).toEqual(['An account already uses that e-mail address.']);
    expect(root.querySelector('[role=alert]')).toBeNull();
  });

  it('shows server field errors under their fields', async () => {
    const { fixture, root, http } = await renderRegister();
    type(root, 'input[formcontrolname=name]', 'Marigold');
    type(root, 'input[type=email]', 'marigold@example.org');
    type(root, 'input[formcontrolname=password]', 'marigold-2024-xyz');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    http.expectOne('/api/auth/register').flush(
      {
        error: {
          code: 'VALIDATION_FAILED',
          message: '1 invalid field',
          fields: [{ path: 'password', message: 'Do not use your e-mail name in the password.' }],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    await fixture.whenStable();
    expect(errorsOf(root)).toEqual(['Do not use your e-mail name in the password.']);
  });

  it('signs the new member in and opens their systems', async () => {
    const { fixture, root, http } = await renderRegister();
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    type(root, 'input[formcontrolname=name]', ' Rowan Reed ');
    type(root, 'input[type=email]', 'rowan@example.org');
    type(root, 'input[formcontrolname=password]', 'gravel beds drain fast');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    const request = http.expectOne('/api/auth/register');
    expect(request.request.body).toEqual({
      name: 'Rowan Reed',
      email: 'rowan@example.org',
      password: 'gravel beds drain fast',
    });
    request.flush({ user: newUser }, { status: 201, statusText: 'Created' });
    await settle();
    http.expectOne('/api/auth/me').flush({ user: newUser });
    await settle();
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith('/systems');
  });
});
