import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { SizingReport } from '../../../../shared/contracts/sizing';
import { SafetyCautions } from '../../ui/safety-cautions/safety-cautions';
import { SystemsApi } from '../systems/systems-api';
import { UnitPreference } from '../systems/unit-preference';
import { problemWords } from '../window/problem-words';
import { CHECK_GROUPS } from './check-reading';
import { CheckList } from './check-list';
import { SizingApi } from './sizing-api';

/**
 * `/systems/:id/sizing`: the designer's checks on one page, each a verdict with its value, limit
 * and source (cold start, power cut and restart, leaks, rules of thumb, loads), then the cautions.
 */
@Component({
  selector: 'tw-sizing-page',
  imports: [
    CheckList,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    RouterLink,
    SafetyCautions,
  ],
  templateUrl: './sizing-page.html',
  styleUrl: './sizing-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SizingPage {
  /** The system id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(SizingApi);
  private readonly systems = inject(SystemsApi);
  protected readonly units = inject(UnitPreference).system;
  protected readonly name = signal('');
  protected readonly report = signal<SizingReport | null>(null);
  protected readonly problem = signal<string | null>(null);

  protected readonly groups = computed(() => {
    const checks = this.report()?.checks ?? [];
    return CHECK_GROUPS.map((g) => ({
      title: g.title,
      checks: checks.filter((c) => g.checks.includes(c.check)),
    })).filter((g) => g.checks.length > 0);
  });
  protected readonly counts = computed(() => {
    const checks = this.report()?.checks ?? [];
    return {
      fails: checks.filter((c) => c.status === 'fails').length,
      warning: checks.filter((c) => c.status === 'warning').length,
      ok: checks.filter((c) => c.status === 'ok').length,
    };
  });

  constructor() {
    effect(() => void this.load(this.id()));
  }

  private async load(systemId: string): Promise<void> {
    this.report.set(null);
    try {
      const [system, report] = await Promise.all([
        this.systems.get(systemId),
        this.api.report(systemId),
      ]);
      this.name.set(system.name);
      this.report.set(report);
    } catch (error) {
      this.problem.set(problemWords(error, 'The sizing checks could not be run.'));
    }
  }
}
