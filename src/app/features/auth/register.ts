import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { PASSWORD_MIN_LENGTH, PasswordSchema } from '../../../../shared/contracts/auth';
import { AuthState } from '../../core/auth/auth-state';
import { applyServerErrors } from './apply-server-errors';
import { AuthApi } from './auth-api';
import { controlErrorMessage } from './control-error-message';
import { zodValidator } from './zod-validator';

/** Create an account: name, e-mail and a password checked by the same rule as the server. */
@Component({
  selector: 'tw-register',
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
  templateUrl: './register.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Register {
  private readonly api = inject(AuthApi);
  private readonly auth = inject(AuthState);
  private readonly router = inject(Router);

  protected readonly minLength = PASSWORD_MIN_LENGTH;
  protected readonly form = new FormGroup({
    name: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(120)],
    }),
    email: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.email],
    }),
    password: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, zodValidator(PasswordSchema)],
    }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly showPassword = signal(false);

  private readonly formChanges = toSignal(this.form.events, { initialValue: null });
  protected readonly nameError = computed(() => {
    this.formChanges();
    return controlErrorMessage(
      this.form.controls.name.errors,
      'Enter your name as others should see it.',
    );
  });
  protected readonly emailError = computed(() => {
    this.formChanges();
    return controlErrorMessage(this.form.controls.email.errors, 'Enter your e-mail address.');
  });
  protected readonly passwordError = computed(() => {
    this.formChanges();
    return controlErrorMessage(this.form.controls.password.errors, 'Choose a password.');
  });

  protected togglePasswordVisibility(): void {
    this.showPassword.update((shown) => !shown);
  }

  protected async createAccount(): Promise<void> {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    const { name, email, password } = this.form.getRawValue();
    try {
      await this.api.register({ name: name.trim(), email: email.trim(), password });
      await this.auth.refresh();
      await this.router.navigateByUrl('/systems');
    } catch (error: unknown) {
      this.failure.set(applyServerErrors(this.form, error, { EMAIL_TAKEN: 'email' }));
    } finally {
      this.busy.set(false);
    }
  }
}
