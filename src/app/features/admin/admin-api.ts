import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type AdminUser,
  AdminUserListSchema,
  type AdminUserPatch,
  AdminUserResponseSchema,
  type OutboxMessage,
  OutboxListSchema,
} from '../../../../shared/contracts/admin';

/** The `/api/admin` resource (admin role only); answers parsed with the shared contracts. */
@Injectable({ providedIn: 'root' })
export class AdminApi {
  private readonly http = inject(HttpClient);

  /** Every user, by e-mail address. */
  async listUsers(): Promise<AdminUser[]> {
    return AdminUserListSchema.parse(
      await firstValueFrom(this.http.get<unknown>('/api/admin/users')),
    ).users;
  }

  /** Changes a user's role or disabled flag; 409 `CANNOT_CHANGE_SELF` for one's own admin role. */
  async patchUser(userId: string, patch: AdminUserPatch): Promise<AdminUser> {
    const body = await firstValueFrom(
      this.http.patch<unknown>(`/api/admin/users/${encodeURIComponent(userId)}`, patch),
    );
    return AdminUserResponseSchema.parse(body).user;
  }

  /** Mail the local SMTP server received, newest first. */
  async listOutbox(): Promise<OutboxMessage[]> {
    return OutboxListSchema.parse(await firstValueFrom(this.http.get<unknown>('/api/admin/outbox')))
      .messages;
  }
}
