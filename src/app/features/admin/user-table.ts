import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import type { AdminUser, AdminUserPatch } from '../../../../shared/contracts/admin';
import type { UserRole } from '../../../../shared/contracts/auth';
import { AuthState } from '../../core/auth/auth-state';
import { failureMessage } from './failure-message';
import { AdminApi } from './admin-api';

/** The users table: search, change a role, disable or enable an account. */
@Component({
  selector: 'tw-user-table',
  imports: [
    DatePipe,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSlideToggleModule,
    MatTableModule,
  ],
  templateUrl: './user-table.html',
  styleUrl: './user-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UserTable {
  private readonly api = inject(AdminApi);
  private readonly auth = inject(AuthState);

  protected readonly roles: readonly UserRole[] = ['admin', 'instructor', 'member'];
  protected readonly columns = ['name', 'email', 'role', 'active', 'createdAt'];
  protected readonly users = signal<AdminUser[]>([]);
  protected readonly loading = signal(true);
  protected readonly query = signal('');
  protected readonly problem = signal<string | null>(null);
  protected readonly savedNote = signal<string | null>(null);
  protected readonly myId = computed(() => this.auth.user()?.id ?? null);
  protected readonly shown = computed(() => {
    const q = this.query().trim().toLowerCase();
    return q
      ? this.users().filter((u) => u.name.toLowerCase().includes(q) || u.email.includes(q))
      : this.users();
  });

  constructor() {
    void this.load();
  }

  protected async load(): Promise<void> {
    this.loading.set(true);
    try {
      this.users.set(await this.api.listUsers());
      this.problem.set(null);
    } catch (error: unknown) {
      this.problem.set(failureMessage(error));
    } finally {
      this.loading.set(false);
    }
  }

  protected search(event: Event): void {
    this.query.set((event.target as HTMLInputElement).value);
  }

  protected changeRole(user: AdminUser, role: UserRole): void {
    void this.save(user, { role }, `${user.name} is now ${role === 'admin' ? 'an' : 'a'} ${role}.`);
  }

  protected setActive(user: AdminUser, active: boolean): void {
    void this.save(
      user,
      { disabled: !active },
      active ? `${user.name} can sign in again.` : `${user.name} is disabled and signed out.`,
    );
  }

  private async save(user: AdminUser, patch: AdminUserPatch, note: string): Promise<void> {
    this.problem.set(null);
    this.savedNote.set(null);
    try {
      const saved = await this.api.patchUser(user.id, patch);
      this.users.update((all) => all.map((u) => (u.id === saved.id ? saved : u)));
      this.savedNote.set(note);
    } catch (error: unknown) {
      this.problem.set(failureMessage(error));
      // Put the controls back to what the server holds.
      this.users.update((all) => [...all]);
    }
  }
}
