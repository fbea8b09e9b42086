import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { ResetPassword } from './reset-password';

async function renderReset(token?: string) {
  TestBed.configureTestingModule({
    imports: [ResetPassword],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(ResetPassword);
  if (token !== undefined) fixture.componentRef.setInput('token', token);
  await fixture.whenStable();
  return {
    fixture,
    root: fixture.nativeElement as HTMLElement,
    http: TestBed.inject(HttpTestingController),
  };
}

function typePassword(root: HTMLElement, value: string): void {
  const input = root.querySelector<HTMLInputElement>('input[formcontrolname=password]');
  if (!input) throw new Error('No password input.');
  input.value = value;
  input.dispatchEvent(new Event('input'));
}

const settle = () => new Promise((resolve) => setTimeout(resolve));

describe('ResetPassword', () => {
  it('says the link is needed when the page has no token', async () => {
    const { root } = await renderReset();
    expect(root.querySelector('[role=alert]')?.textContent).toContain(
      'needs the link from the reset e-mail',
    );
    expect(root.querySelector('form')).toBeNull();
  });

  it('sends the token with the new password and confirms', async () => {
    const { fixture, root, http } = await renderReset('tok_abcdefghijklmnopqrstuvwxyz');
    typePassword(root, 'a new long phrase');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    const request = http.expectOne('/api/auth/password-reset/confirm');
    expect(request.request.body).toEqual({
      token: 'tok_abcdefghijklmnopqrstuvwxyz',
      password: 'a new long phrase',
    });
    request.flush(null, { status: 204, statusText: 'No Content' });
    await settle();
    http.expectOne('/api/auth/me').flush(null, { status: 401, statusText: 'Unauthorized' });
    await settle();
    await fixture.whenStable();
    expect(root.querySelector('[role=status]')?.textContent).toContain('Your password is changed');
  });

  it("shows the server's words for a spent link and offers a new one", async () => {
    const { fixture, root, http } = await renderReset('tok_abcdefghijklmnopqrstuvwxyz');
    typePassword(root, 'a new long phrase');
    root.querySelector('form')?.dispatchEvent(new Event('submit'));
    http.expectOne('/api/auth/password-reset/confirm').flush(
      {
        error: {
          code: 'RESET_TOKEN_INVALID',
          message: 'This reset link is invalid, used or expired.',
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    await fixture.whenStable();
    expect(root.querySelector('[role=alert]')?.textContent).toContain(
      'This reset link is invalid, used or expired.',
    );
    expect([...root.querySelectorAll('a')].map((a) => a.textContent?.trim())).toContain(
      'Ask for a new link',
    );
  });
});
