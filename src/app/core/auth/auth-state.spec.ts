import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { User } from '../../../../shared/contracts/auth';
import { AuthState } from './auth-state';

const member: User = {
  id: 'u-3',
  name: 'Cy',
  email: 'cy@example.org',
  role: 'member',
  units: 'us',
};

function setUp() {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  return { auth: TestBed.inject(AuthState), http: TestBed.inject(HttpTestingController) };
}

describe('AuthState', () => {
  it('asks the server who is signed in only once, however often ready() is called', async () => {
    const { auth, http } = setUp();
    const first = auth.ready();
    const second = auth.ready();
    http.expectOne('/api/auth/me').flush({ user: member });
    expect(await first).toEqual(member);
    expect(await second).toEqual(member);
    expect(auth.role()).toBe('member');
    http.verify();
  });

  it('counts a 401 from "who am I" as signed out, and marks the session known', async () => {
    const { auth, http } = setUp();
    expect(auth.loaded()).toBe(false);
    const ready = auth.ready();
    http.expectOne('/api/auth/me').flush(null, { status: 401, statusText: 'Unauthorized' });
    expect(await ready).toBeNull();
    expect(auth.loaded()).toBe(true);
  });

  it('refuses a "who am I" answer that is not a {user} body', async () => {
    const { auth, http } = setUp();
    const ready = auth.ready();
    http.expectOne('/api/auth/me').flush({ user: { ...member, role: 'owner' } });
    await expect(ready).rejects.toThrow();
  });

  it('signs out locally even when the server refuses the logout', async () => {
    const { auth, http } = setUp();
    const ready = auth.ready();
    http.expectOne('/api/auth/me').flush({ user: member });
    await ready;
    const done = auth.signOut();
    http.expectOne('/api/auth/logout').flush(null, { status: 500, statusText: 'Server Error' });
    await done;
    expect(auth.user()).toBeNull();
    expect(await auth.ready()).toBeNull();
  });
});
