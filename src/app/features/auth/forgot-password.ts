import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { applyServerErrors } from './apply-server-errors';
import { AuthApi } from './auth-api';
import { controlErrorMessage } from './control-error-message';

/** Ask for a password reset link by e-mail. */
@Component({
  selector: 'tw-forgot-password',
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
  templateUrl: './forgot-password.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPassword {
  private readonly api = inject(AuthApi);

  protected readonly form = new FormGroup({
    email: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.email],
    }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** The server's answer once the request is accepted. */
  protected readonly sent = signal<string | null>(null);

  private readonly formChanges = toSignal(this.form.events, { initialValue: null });
  protected readonly emailError = computed(() => {
    this.formChanges();
    return controlErrorMessage(
      this.form.controls.email.errors,
      'Enter the e-mail address of your account.',
    );
  });

  protected async sendLink(): Promise<void> {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    try {
      this.sent.set(await this.api.requestPasswordReset(this.form.controls.email.value.trim()));
    } catch (error: unknown) {
      this.failure.set(applyServerErrors(this.form, error));
    } finally {
      this.busy.set(false);
    }
  }
}
