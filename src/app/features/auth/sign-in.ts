import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { AuthState } from '../../core/auth/auth-state';
import { SafetyCautions } from '../../ui/safety-cautions/safety-cautions';
import { fieldErrorMessage } from './field-error-message';

/**
 * The sign-in page, which is also the home page of a signed-out visitor: what Tidewright does,
 * the e-mail and password form, and the safety cautions.
 */
@Component({
  selector: 'tw-sign-in',
  imports: [
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RouterLink,
    SafetyCautions,
  ],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(AuthState);
  private readonly router = inject(Router);

  /** Where to go after signing in (from `?returnUrl=`); only same-site paths are followed. */
  readonly returnUrl = input<string | undefined>(undefined);

  protected readonly form = new FormGroup({
    email: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.email],
    }),
    password: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** A new value on every form event, so the error messages below recompute. */
  private readonly formChanges = toSignal(this.form.events, { initialValue: null });
  protected readonly emailError = computed(() => {
    this.formChanges();
    return fieldErrorMessage('email', this.form.controls.email.errors);
  });
  protected readonly passwordError = computed(() => {
    this.formChanges();
    return fieldErrorMessage('password', this.form.controls.password.errors);
  });

  protected async submit(): Promise<void> {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    const { email, password } = this.form.getRawValue();
    const result = await this.auth.signIn(email.trim(), password);
    this.busy.set(false);
    if (result.status === 'rejected') {
      this.failure.set(result.message);
      return;
    }
    await this.router.navigateByUrl(safeReturnUrl(this.returnUrl()));
  }
}

/** The return URL if it is a path on this site, else `/systems` (no open redirects). */
function safeReturnUrl(returnUrl: string | undefined): string {
  if (!returnUrl || !returnUrl.startsWith('/') || returnUrl.startsWith('//')) return '/systems';
  if (returnUrl.startsWith('/sign-in')) return '/systems';
  return returnUrl;
}
