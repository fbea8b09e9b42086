import { ChangeDetectionStrategy, Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { AuthState } from './auth-state';
import type { User, UserRole } from '../../../../shared/contracts/auth';
import { roleGuard, signedOutGuard } from './role-guard';

@Component({ template: 'page', changeDetection: ChangeDetectionStrategy.OnPush })
class Page {}

function setUp(user: User | null): { router: Router } {
  TestBed.configureTestingModule({
    providers: [
      // The guards only ask whether the session is known and who it belongs to.
      { provide: AuthState, useValue: { ready: () => Promise.resolve(user) } },
      provideRouter([
        { path: '', component: Page, canActivate: [signedOutGuard] },
        { path: 'sign-in', component: Page },
        { path: 'systems', component: Page, canMatch: [roleGuard()] },
        { path: 'admin/users', component: Page, canMatch: [roleGuard('admin')] },
        { path: 'classes', component: Page, canActivate: [roleGuard('instructor', 'admin')] },
      ]),
    ],
  });
  return { router: TestBed.inject(Router) };
}

function user(role: UserRole): User {
  return { id: 'u-2', name: 'Bo', email: 'bo@example.org', role, units: 'metric' };
}

describe('roleGuard', () => {
  it('sends a signed-out visitor to sign in, keeping the address asked for', async () => {
    const { router } = setUp(null);
    await router.navigateByUrl('/admin/users');
    expect(router.url).toBe('/sign-in?returnUrl=%2Fadmin%2Fusers');
  });

  it('lets an admin into an admin route', async () => {
    const { router } = setUp(user('admin'));
    await router.navigateByUrl('/admin/users');
    expect(router.url).toBe('/admin/users');
  });

  it('sends a member away from an admin route', async () => {
    const { router } = setUp(user('member'));
    await router.navigateByUrl('/admin/users');
    // Home, whose guard then forwards a signed-in user to their systems.
    expect(router.url).toBe('/systems');
  });

  it('works as canActivate too', async () => {
    const { router } = setUp(user('member'));
    await router.navigateByUrl('/classes');
    expect(router.url).toBe('/systems');
  });

  it('lets any signed-in role through when no roles are given', async () => {
    const { router } = setUp(user('member'));
    await router.navigateByUrl('/systems');
    expect(router.url).toBe('/systems');
  });
});

describe('signedOutGuard', () => {
  it('keeps a signed-out visitor on the home page', async () => {
    const { router } = setUp(null);
    await router.navigateByUrl('/');
    expect(router.url).toBe('/');
  });

  it('forwards a signed-in user from home to their systems', async () => {
    const { router } = setUp(user('instructor'));
    await router.navigateByUrl('/');
    expect(router.url).toBe('/systems');
  });
});
