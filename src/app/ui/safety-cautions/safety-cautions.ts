import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { CAUTIONS, type CautionTopic } from './caution-topics';

/**
 * A card listing the usual safety cautions for a fish-and-plant system, stated as common
 * practice that defers to local codes and licensed trades. Pass `topics` to show only some.
 *
 * @example <tw-safety-cautions [topics]="['electrical', 'heavy-beds']" />
 */
@Component({
  selector: 'tw-safety-cautions',
  imports: [MatCardModule, MatIconModule],
  templateUrl: './safety-cautions.html',
  styleUrl: './safety-cautions.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SafetyCautions {
  /** The cautions to show, in their usual order; all of them when not set. */
  readonly topics = input<readonly CautionTopic[] | undefined>(undefined);

  protected readonly cautions = computed(() => {
    const wanted = this.topics();
    return wanted ? CAUTIONS.filter((caution) => wanted.includes(caution.topic)) : CAUTIONS;
  });
}
