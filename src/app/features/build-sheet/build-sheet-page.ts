import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  ViewEncapsulation,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import type { BuildSheet, SizingCheck } from '../../../../shared/contracts/sizing';
import { formatQuantity } from '../../../../shared/scenario';
import { SafetyCautions } from '../../ui/safety-cautions/safety-cautions';
import { CheckList } from '../sizing/check-list';
import { SizingApi } from '../sizing/sizing-api';
import { PumpCurveChart } from '../systems/system-editor/pump-curve-chart';
import { UnitPreference } from '../systems/unit-preference';
import { problemWords } from '../window/problem-words';
import { bellWords, cutLength, guardWords, standpipeWords } from './cut-words';

/**
 * `/systems/:id/build-sheet`: the printable build sheet. Per bed the standpipe cut length (from
 * the bed floor and the bulkhead fitting's depth), bell, slots, guard and drain parts; each pump's
 * duty point on its curve; the sizing verdicts; the safety cautions. Print (or save as PDF) from
 * the browser: the print styles keep only the sheet.
 */
@Component({
  selector: 'tw-build-sheet-page',
  imports: [
    CheckList,
    DatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    PumpCurveChart,
    ReactiveFormsModule,
    RouterLink,
    SafetyCautions,
  ],
  templateUrl: './build-sheet-page.html',
  styleUrl: './build-sheet-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  // The print rules must reach the page shell around the sheet to hide it.
  encapsulation: ViewEncapsulation.None,
})
export class BuildSheetPage {
  /** The system id from the route. */
  readonly id = input.required<string>();

  private readonly api = inject(SizingApi);
  protected readonly units = inject(UnitPreference).system;
  protected readonly sheet = signal<BuildSheet | null>(null);
  protected readonly checks = signal<readonly SizingCheck[] | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly today = new Date();
  protected readonly depth = new FormControl<number | null>(null);
  protected readonly depthUnit = computed(() => (this.units() === 'us' ? 'in' : 'mm'));

  protected readonly beds = computed(() => {
    const system = this.units();
    return (this.sheet()?.beds ?? []).map((bed) => ({
      bed,
      standpipe: standpipeWords(bed, system),
      bell: bellWords(bed, system),
      guard: guardWords(bed, system),
      parts: bed.parts.map((p) => ({
        ...p,
        length: p.lengthM === null ? '' : cutLength(p.lengthM, system),
      })),
    }));
  });
  protected readonly pumps = computed(() => {
    const system = this.units();
    return (this.sheet()?.pumps ?? []).map((pump) => ({
      pump,
      points: pump.curve.map((p) => ({ flow: p.flowM3PerS, head: p.headM })),
      words: pump.dry
        ? `Pump ${pump.pumpId} starts dry: its source is at or below the intake.`
        : `Pump ${pump.pumpId} runs at ${formatQuantity(pump.flowM3PerS, 'flow', system)} against ${formatQuantity(pump.headM, 'length', system)} of head; ` +
          pump.outlets
            .map((o) => `${formatQuantity(o.flowM3PerS, 'flow', system)} to ${o.to}`)
            .join(', ') +
          '.',
    }));
  });

  constructor() {
    effect(() => void this.load(this.id()));
  }

  private async load(systemId: string, fittingDepth?: string): Promise<void> {
    try {
      this.sheet.set(await this.api.buildSheet(systemId, fittingDepth));
      if (this.checks() === null) this.checks.set((await this.api.report(systemId)).checks);
    } catch (error) {
      this.problem.set(problemWords(error, 'The build sheet could not be made.'));
    }
  }

  /** Recomputes the cut lengths with the entered bulkhead fitting depth (blank: each size's socket depth). */
  protected applyDepth(): void {
    const value = this.depth.value;
    void this.load(this.id(), value === null ? undefined : `${value} ${this.depthUnit()}`);
  }

  /** Opens the browser's print dialog (which can also save a PDF). */
  protected print(): void {
    window.print();
  }
}
