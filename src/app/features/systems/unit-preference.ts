import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { UnitSystem } from '../../../../shared/scenario';
import { AuthState } from '../../core/auth/auth-state';

/**
 * The reader's unit system (metric or US customary), kept on their profile: every quantity field,
 * axis and read-out follows it, while stored values stay in SI.
 */
@Injectable({ providedIn: 'root' })
export class UnitPreference {
  private readonly auth = inject(AuthState);
  private readonly http = inject(HttpClient);

  /** The signed-in user's choice; metric until someone is signed in. */
  readonly system = computed<UnitSystem>(() => this.auth.user()?.units ?? 'metric');

  /** Saves a new choice on the profile and reloads the session so every view follows it. */
  async choose(system: UnitSystem): Promise<void> {
    if (system === this.system()) return;
    await firstValueFrom(this.http.patch<unknown>('/api/auth/me', { units: system }));
    await this.auth.refresh();
  }
}
