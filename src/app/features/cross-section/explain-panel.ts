import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { PHASE_WORDS } from './phase-words';
import type { PhaseExplanation } from './phase-explanation';

/**
 * The physics of one bed's current phase: the law in use, its equation, the same equation with the
 * live numbers put in, each symbol with its meaning and value, and the idea in plain words.
 */
@Component({
  selector: 'tw-explain-panel',
  template: `
    <section class="explain" aria-labelledby="explain-heading">
      <div class="head">
        <h3 id="explain-heading">How it works now</h3>
        <label>
          <span>Bed</span>
          <select [value]="bedId()" (change)="readBed($event)">
            @for (id of bedIds(); track id) {
              <option [value]="id" [selected]="id === bedId()">{{ id }}</option>
            }
          </select>
        </label>
      </div>
      @if (explanation(); as e) {
        <p class="law">
          <strong>{{ e.bedId }} is {{ phaseWords[e.phase].label }}</strong> — {{ e.law }}
        </p>
        <p class="equation num">{{ e.equation }}</p>
        <p class="substituted num">{{ e.substituted }}</p>
        <dl>
          @for (v of e.values; track v.symbol) {
            <div>
              <dt class="num">{{ v.symbol }}</dt>
              <dd>
                <span class="meaning">{{ v.meaning }}</span><span class="value num">{{
                  v.value
                }}</span>
              </dd>
            </div>
          }
        </dl>
        <p class="words">{{ e.words }}</p>
      }
    </section>
  `,
  styleUrl: './explain-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExplainPanel {
  /** The explanation to show, or null when there is no bed. */
  readonly explanation = input.required<PhaseExplanation | null>();
  /** The beds one may pick from. */
  readonly bedIds = input.required<readonly string[]>();
  /** The bed shown. */
  readonly bedId = input.required<string>();
  /** Asked to explain another bed. */
  readonly bedChange = output<string>();

  protected readonly phaseWords = PHASE_WORDS;

  protected readBed(event: Event): void {
    this.bedChange.emit((event.target as HTMLSelectElement).value);
  }
}
