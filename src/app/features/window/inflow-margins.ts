import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { BedInflowWindow } from '../../../../shared/contracts/sweeps';
import { type UnitSystem, formatQuantity } from '../../../../shared/scenario';
import { REGIME_STYLES } from './regime-style';

const WIDTH = 420;

/** One bed's window as read: a sentence, and bar positions 0–WIDTH for its ranges and inflow. */
interface Margin {
  readonly bedId: string;
  readonly sentence: string;
  readonly tone: 'ok' | 'warning' | 'fails';
  readonly lowX: number;
  readonly highX: number;
  readonly inflowX: number;
}

/** A bed's margin in words, in the reader's units. */
export function marginSentence(w: BedInflowWindow, system: UnitSystem): string {
  const flow = (q: number) => formatQuantity(q, 'flow', system);
  const gives = `Your pump gives ${w.bedId} ${flow(w.inflowM3PerS)}`;
  if (!w.cyclingRange) {
    return `${gives}; no steady inflow makes this bed cycle (${w.spillAtRimM3PerS < w.primingInflowM3PerS ? 'the rim is too close above the standpipe to reach the priming flow' : 'its siphon at the break level carries less than the priming flow'}).`;
  }
  const range = `this bed cycles between ${flow(w.cyclingRange.lowM3PerS)} and ${flow(w.cyclingRange.highM3PerS)}`;
  const where =
    w.regime === 'cycling'
      ? `${Math.round((100 * (w.inflowM3PerS - w.cyclingRange.lowM3PerS)) / w.cyclingRange.lowM3PerS)} % above the lowest and ${Math.round((100 * (w.cyclingRange.highM3PerS - w.inflowM3PerS)) / w.cyclingRange.highM3PerS)} % below the highest`
      : w.regime === 'spill-stall' || w.regime === 'idle'
        ? 'too little to prime the siphon'
        : 'too much for the siphon to break';
  return `${gives}; ${range} (${where}).`;
}

/**
 * Each bell-siphon bed's cycling inflow range, solved from the flow balance, with the inflow its
 * pumps give it: a sentence and a bar (spill stall | cycling | siphon lock, the pump's flow marked).
 */
@Component({
  selector: 'tw-inflow-margins',
  template: `
    @for (m of margins(); track m.bedId) {
      <div class="margin" [attr.data-bed]="m.bedId">
        <p class="sentence" [class]="m.tone">{{ m.sentence }}</p>
        <svg class="bar" [attr.viewBox]="'0 0 ' + width + ' 22'" aria-hidden="true">
          <rect x="0" y="6" [attr.width]="m.lowX" height="10" [attr.fill]="colors.stall" />
          <rect
            [attr.x]="m.lowX"
            y="6"
            [attr.width]="m.highX - m.lowX"
            height="10"
            [attr.fill]="colors.cycling"
          />
          <rect
            [attr.x]="m.highX"
            y="6"
            [attr.width]="width - m.highX"
            height="10"
            [attr.fill]="colors.lock"
          />
          <line
            [attr.x1]="m.inflowX"
            [attr.x2]="m.inflowX"
            y1="1"
            y2="21"
            stroke="#111"
            stroke-width="3"
          />
        </svg>
      </div>
    } @empty {
      <p class="none">This system has no bell-siphon bed, so no inflow window to show.</p>
    }
  `,
  styles: `
    .margin {
      margin-bottom: 0.75rem;
    }
    .sentence {
      margin: 0 0 0.25rem;
    }
    .sentence.warning,
    .sentence.fails {
      font-weight: 500;
    }
    .bar {
      display: block;
      width: 100%;
      max-width: 28rem;
      height: auto;
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InflowMargins {
  readonly windows = input.required<readonly BedInflowWindow[]>();
  readonly system = input<UnitSystem>('metric');

  protected readonly width = WIDTH;
  protected readonly colors = {
    stall: REGIME_STYLES['spill-stall'].color,
    cycling: REGIME_STYLES.cycling.color,
    lock: REGIME_STYLES['siphon-lock'].color,
  };
  protected readonly margins = computed(() =>
    this.windows().map((w): Margin => {
      const low = w.cyclingRange?.lowM3PerS ?? w.primingInflowM3PerS;
      const high = w.cyclingRange?.highM3PerS ?? low;
      const top = Math.max(high * 1.4, w.inflowM3PerS * 1.15, 1e-9);
      const at = (q: number) => Math.min(WIDTH, Math.max(0, (q / top) * WIDTH));
      const tone = w.regime === 'cycling' ? 'ok' : 'fails';
      return {
        bedId: w.bedId,
        sentence: marginSentence(w, this.system()),
        tone,
        lowX: at(low),
        highX: at(high),
        inflowX: at(w.inflowM3PerS),
      };
    }),
  );
}
