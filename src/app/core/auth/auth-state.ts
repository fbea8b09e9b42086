/** Who is signed in, read from the session cookie through the auth endpoints. */
import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { ApiError } from '../../../../shared/contracts/api-error';
import type { User, UserRole } from '../../../../shared/contracts/auth';

/*
 * The zod-based readers are imported lazily: zod is large, and keeping it off the static import
 * graph keeps it out of the first download. Each import starts alongside the request it serves.
 */
const loadMeReader = () => import('./read-me-response').then((m) => m.readMeResponse);
const loadErrorReader = () => import('../http/read-api-error').then((m) => m.readApiError);

/** What `signIn` ends with: the user, or a message the sign-in form can show as it is. */
export type SignInResult =
  | { readonly status: 'signed-in'; readonly user: User }
  | { readonly status: 'rejected'; readonly message: string };

/**
 * The session of this browser tab. `user` is null while signed out (and until the first
 * `GET /api/auth/me` answers; `loaded` tells the two apart).
 */
@Injectable({ providedIn: 'root' })
export class AuthState {
  private readonly http = inject(HttpClient);
  private readonly current = signal<User | null>(null);
  private readonly settled = signal(false);
  private firstLoad: Promise<User | null> | null = null;

  /** The signed-in user, or null. */
  readonly user = this.current.asReadonly();
  /** True once the session has been asked for at least once. */
  readonly loaded = this.settled.asReadonly();
  /** The signed-in user's role, or null when signed out. */
  readonly role = computed<UserRole | null>(() => this.current()?.role ?? null);

  /**
   * Resolves with the current user once the session is known; asks the server only the first
   * time, and afterwards reflects sign-in, sign-out and `forget()`.
   */
  async ready(): Promise<User | null> {
    this.firstLoad ??= this.refresh();
    await this.firstLoad;
    return this.current();
  }

  /** Asks the server who is signed in; a 401 (or no server) means nobody. */
  async refresh(): Promise<User | null> {
    try {
      const reader = loadMeReader();
      const body = await firstValueFrom(this.http.get<unknown>('/api/auth/me'));
      this.current.set((await reader)(body));
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.current.set(null);
    } finally {
      this.settled.set(true);
    }
    return this.current();
  }

  /**
   * Signs in with e-mail and password; failures come back as a message, never as a throw. Waits
   * for the first session look-up, whose answer also sets the XSRF-TOKEN cookie the POST echoes.
   */
  async signIn(email: string, password: string): Promise<SignInResult> {
    await this.ready();
    const reader = loadMeReader();
    let body: unknown;
    try {
      body = await firstValueFrom(this.http.post<unknown>('/api/auth/login', { email, password }));
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      return { status: 'rejected', message: signInFailureMessage(error, await loadErrorReader()) };
    }
    const user = (await reader)(body);
    this.current.set(user);
    this.settled.set(true);
    return { status: 'signed-in', user };
  }

  /** Ends the session on the server; the tab counts as signed out whatever the server answers. */
  async signOut(): Promise<void> {
    try {
      await firstValueFrom(this.http.post<unknown>('/api/auth/logout', {}));
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
    } finally {
      this.forget();
    }
  }

  /** Drops the user without asking the server, e.g. after any request answered 401. */
  forget(): void {
    this.current.set(null);
    this.settled.set(true);
  }
}

/** The sentence shown under the sign-in form for a failed login. */
function signInFailureMessage(
  error: HttpErrorResponse,
  readApiError: (body: unknown) => ApiError | null,
): string {
  if (error.status === 0) {
    return 'The Tidewright server did not answer. Check your connection (or that the server is running) and try again.';
  }
  const body = readApiError(error.error);
  if (body && error.status < 500) return body.error.message;
  if (error.status === 401 || error.status === 400) {
    return 'That e-mail and password do not match an account. Check both and try again.';
  }
  if (error.status === 429) return 'Too many sign-in attempts. Wait a minute, then try again.';
  return 'The server could not sign you in just now. Try again in a moment.';
}
