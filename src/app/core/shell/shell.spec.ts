import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { User, UserRole } from '../../../../shared/contracts/auth';
import { Shell } from './shell';

function userWithRole(role: UserRole): User {
  return { id: 'u-1', name: 'Ada Rivers', email: 'ada@example.org', role, units: 'metric' };
}

/** Renders the shell after `/api/auth/me` answered with `user` (or 401 when null). */
async function renderShell(user: User | null): Promise<HTMLElement> {
  TestBed.configureTestingModule({
    imports: [Shell],
    providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(Shell);
  const http = TestBed.inject(HttpTestingController);
  const me = http.expectOne('/api/auth/me');
  if (user) me.flush({ user });
  else
    me.flush(
      { error: { code: 'UNAUTHENTICATED', message: 'Sign in first.' } },
      { status: 401, statusText: 'Unauthorized' },
    );
  await fixture.whenStable();
  http.verify();
  return fixture.nativeElement as HTMLElement;
}

function navLabels(root: HTMLElement): string[] {
  return [...root.querySelectorAll('nav a')].map(
    (link) => link.textContent?.replace(/\s+/g, ' ').trim() ?? '',
  );
}

describe('Shell', () => {
  beforeEach(() => localStorage.clear());

  it('shows Systems, Classes and Admin to an admin', async () => {
    const root = await renderShell(userWithRole('admin'));
    expect(navLabels(root).map((label) => label.split(' ').pop())).toEqual([
      'Systems',
      'Classes',
      'Admin',
    ]);
  });

  it('hides Admin but shows Classes to an instructor', async () => {
    const labels = navLabels(await renderShell(userWithRole('instructor')));
    expect(labels.some((label) => label.endsWith('Classes'))).toBe(true);
    expect(labels.some((label) => label.endsWith('Admin'))).toBe(false);
  });

  it('shows a member Systems and Classes (where they are a student), not Admin', async () => {
    const labels = navLabels(await renderShell(userWithRole('member')));
    expect(labels.map((label) => label.split(' ').pop())).toEqual(['Systems', 'Classes']);
  });

  it('shows the user name when signed in and a Sign in button when not', async () => {
    const signedIn = await renderShell(userWithRole('member'));
    expect(signedIn.querySelector('.account')?.textContent).toContain('Ada Rivers');
    expect(signedIn.querySelector('.sign-in')).toBeNull();

    TestBed.resetTestingModule();
    const signedOut = await renderShell(null);
    expect(signedOut.querySelector('.account')).toBeNull();
    expect(signedOut.querySelector('.sign-in')?.textContent?.trim()).toBe('Sign in');
    expect(navLabels(signedOut)).toEqual([]);
  });

  it('names the product in the toolbar', async () => {
    const root = await renderShell(null);
    expect(root.querySelector('.brand-name')?.textContent).toBe('Tidewright');
  });
});
