import { HttpClient } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { InvitationPreview } from '../../../../shared/contracts/classroom';
import { AuthState } from '../../core/auth/auth-state';
import { ClassroomApi } from '../classroom/classroom-api';
import { problemMessage } from '../classroom/problem-message';

/** What the page offers, from the invitation and who is signed in. */
type JoinStep = 'loading' | 'closed' | 'join' | 'other-account' | 'sign-in' | 'register';

/**
 * `/join/:token`, the landing page of an e-mailed class invitation. Signed in with the invited
 * address: one button joins. Signed out: sign in (the address has an account) or register with
 * the invited address, and the class is joined straight after. Signed in as someone else: says so
 * and offers to sign out.
 */
@Component({
  selector: 'tw-join-page',
  imports: [
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
  ],
  templateUrl: './join-page.html',
  styleUrl: './join-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JoinPage {
  private readonly api = inject(ClassroomApi);
  private readonly auth = inject(AuthState);
  private readonly http = inject(HttpClient);
  private readonly router = inject(Router);

  /** From the route: the token of the invitation link. */
  readonly token = input.required<string>();

  protected readonly preview = signal<InvitationPreview | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly user = this.auth.user;
  protected readonly step = computed<JoinStep>(() => {
    const preview = this.preview();
    if (!preview || !this.auth.loaded()) return this.problem() ? 'closed' : 'loading';
    if (preview.status === 'expired') return 'closed';
    const user = this.user();
    if (user) return user.email.toLowerCase() === preview.email ? 'join' : 'other-account';
    if (preview.status === 'accepted') return 'closed';
    return preview.hasAccount ? 'sign-in' : 'register';
  });
  protected readonly heading = computed(() => {
    const preview = this.preview();
    return preview ? `Join “${preview.className}”` : 'Class invitation';
  });
  protected readonly subheading = computed(() => {
    const preview = this.preview();
    return preview ? `${preview.instructorName} invited ${preview.email}` : '';
  });
  protected readonly signInForm = new FormGroup({
    password: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
  });
  protected readonly registration = new FormGroup({
    name: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(120)],
    }),
    password: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.minLength(10)],
    }),
  });

  constructor() {
    void this.auth.ready();
    effect(() => void this.load(this.token()));
  }

  protected async join(): Promise<void> {
    await this.attempt(() => this.accept());
  }

  protected async signInAndJoin(): Promise<void> {
    const preview = this.preview();
    if (!preview || this.signInForm.invalid) return this.signInForm.markAllAsTouched();
    await this.attempt(async () => {
      const result = await this.auth.signIn(preview.email, this.signInForm.controls.password.value);
      if (result.status === 'rejected') this.problem.set(result.message);
      else await this.accept();
    });
  }

  protected async registerAndJoin(): Promise<void> {
    const preview = this.preview();
    if (!preview || this.registration.invalid) return this.registration.markAllAsTouched();
    await this.attempt(async () => {
      const { name, password } = this.registration.getRawValue();
      await firstValueFrom(
        this.http.post<unknown>('/api/auth/register', {
          name: name.trim(),
          email: preview.email,
          password,
        }),
      );
      await this.auth.refresh();
      await this.accept();
    });
  }

  protected async signOut(): Promise<void> {
    await this.auth.signOut();
    await this.load(this.token());
  }

  private async accept(): Promise<void> {
    const joined = await this.api.acceptInvitation(this.token());
    await this.router.navigate(['/classes', joined.classId]);
  }

  private async attempt(action: () => Promise<void>): Promise<void> {
    this.problem.set(null);
    this.busy.set(true);
    try {
      await action();
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    } finally {
      this.busy.set(false);
    }
  }

  private async load(token: string): Promise<void> {
    try {
      this.preview.set(await this.api.invitation(token));
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
