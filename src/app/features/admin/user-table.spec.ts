import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { AdminUser } from '../../../../shared/contracts/admin';
import { AuthState } from '../../core/auth/auth-state';
import { UserTable } from './user-table';

const settle = () => new Promise((resolve) => setTimeout(resolve));

const me: AdminUser = {
  id: 'a1',
  name: 'Ada Admin',
  email: 'ada@example.org',
  role: 'admin',
  units: 'metric',
  disabled: false,
  createdAt: '2026-01-01T00:00:00.000Z',
};
const dana: AdminUser = {
  id: 'd1',
  name: 'Dana Demo',
  email: 'dana@example.org',
  role: 'member',
  units: 'metric',
  disabled: false,
  createdAt: '2026-01-02T00:00:00.000Z',
};

async function renderTable() {
  TestBed.configureTestingModule({
    imports: [UserTable],
    providers: [provideHttpClient(), provideHttpClientTesting()],
  });
  const http = TestBed.inject(HttpTestingController);
  const ready = TestBed.inject(AuthState).ready();
  http
    .expectOne('/api/auth/me')
    .flush({ user: { id: me.id, name: me.name, email: me.email, role: me.role, units: me.units } });
  await ready;
  const fixture = TestBed.createComponent(UserTable);
  http.expectOne('/api/admin/users').flush({ users: [me, dana] });
  await settle();
  await fixture.whenStable();
  return { fixture, root: fixture.nativeElement as HTMLElement, http };
}

describe('UserTable', () => {
  it('lists users and locks the controls of the signed-in administrator', async () => {
    const { root } = await renderTable();
    const rows = [...root.querySelectorAll('tr.mat-mdc-row')];
    expect(rows.map((r) => r.querySelector('td')?.textContent?.trim())).toEqual([
      'Ada Admin',
      'Dana Demo',
    ]);
    const toggles = [...root.querySelectorAll<HTMLButtonElement>('mat-slide-toggle button')];
    expect(toggles.map((t) => t.disabled)).toEqual([true, false]);
  });

  it('disables an account through PATCH and shows the outcome', async () => {
    const { fixture, root, http } = await renderTable();
    const toggle = root.querySelectorAll<HTMLButtonElement>('mat-slide-toggle button')[1];
    toggle?.click();
    const request = http.expectOne('/api/admin/users/d1');
    expect([request.request.method, request.request.body]).toEqual(['PATCH', { disabled: true }]);
    request.flush({ user: { ...dana, disabled: true } });
    await settle();
    await fixture.whenStable();
    expect(root.querySelector('[role=status]')?.textContent).toContain(
      'Dana Demo is disabled and signed out.',
    );
    expect(root.querySelectorAll('tr.disabled')).toHaveLength(1);
  });
});
