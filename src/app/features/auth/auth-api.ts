import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  MeResponseSchema,
  PasswordResetAcceptedSchema,
  type RegisterRequest,
  type User,
} from '../../../../shared/contracts/auth';

/**
 * Registration and password reset (`/api/auth/*`); sign-in and sign-out live in `AuthState`.
 * Answers are parsed with the shared contracts.
 */
@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);

  /** Creates a member account and signs it in; 409 `EMAIL_TAKEN` when the address has one. */
  async register(request: RegisterRequest): Promise<User> {
    const body = await firstValueFrom(this.http.post<unknown>('/api/auth/register', request));
    return MeResponseSchema.parse(body).user;
  }

  /** Asks for a reset link; the answer is the same whether or not the address has an account. */
  async requestPasswordReset(email: string): Promise<string> {
    const body = await firstValueFrom(
      this.http.post<unknown>('/api/auth/password-reset', { email }),
    );
    return PasswordResetAcceptedSchema.parse(body).message;
  }

  /** Sets a new password with the token from the e-mailed link; 400 `RESET_TOKEN_INVALID` if it is spent. */
  async confirmPasswordReset(token: string, password: string): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/password-reset/confirm', { token, password }));
  }
}
