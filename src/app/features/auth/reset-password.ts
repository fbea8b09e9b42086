import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { PASSWORD_MIN_LENGTH, PasswordSchema } from '../../../../shared/contracts/auth';
import { AuthState } from '../../core/auth/auth-state';
import { applyServerErrors } from './apply-server-errors';
import { AuthApi } from './auth-api';
import { controlErrorMessage } from './control-error-message';
import { zodValidator } from './zod-validator';

/** Choose a new password with the token from the e-mailed link (`/reset-password?token=…`). */
@Component({
  selector: 'tw-reset-password',
  imports: [
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './reset-password.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPassword {
  private readonly api = inject(AuthApi);
  private readonly auth = inject(AuthState);

  /** The token from the link's query string. */
  readonly token = input<string | undefined>(undefined);

  protected readonly minLength = PASSWORD_MIN_LENGTH;
  protected readonly form = new FormGroup({
    password: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, zodValidator(PasswordSchema)],
    }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly done = signal(false);
  protected readonly showPassword = signal(false);
  protected readonly hasToken = computed(() => (this.token() ?? '').length > 0);

  private readonly formChanges = toSignal(this.form.events, { initialValue: null });
  protected readonly passwordError = computed(() => {
    this.formChanges();
    return controlErrorMessage(this.form.controls.password.errors, 'Choose a new password.');
  });

  protected togglePasswordVisibility(): void {
    this.showPassword.update((shown) => !shown);
  }

  protected async savePassword(): Promise<void> {
    this.failure.set(null);
    const token = this.token();
    if (this.form.invalid || !token) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    try {
      await this.api.confirmPasswordReset(token, this.form.controls.password.value);
      // The server signed the account out everywhere: if this tab was that account, it is signed out too.
      await this.auth.refresh();
      this.done.set(true);
    } catch (error: unknown) {
      this.failure.set(applyServerErrors(this.form, error));
    } finally {
      this.busy.set(false);
    }
  }
}
