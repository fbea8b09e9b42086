import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { SizingCheck } from '../../../../shared/contracts/sizing';
import type { UnitSystem } from '../../../../shared/scenario';
import { STATUS_ICONS, readCheck } from './check-reading';

/** A list of sizing checks: verdict, title, value against limit, the sentence and the source. */
@Component({
  selector: 'tw-check-list',
  imports: [MatIconModule],
  template: `
    <ul class="checks">
      @for (row of rows(); track row.key) {
        <li class="check" [class]="row.check.status" [attr.data-check]="row.check.check">
          <mat-icon class="icon" [attr.aria-label]="row.check.status">{{ row.icon }}</mat-icon>
          <div class="body">
            <div class="line">
              <span class="title">{{ row.check.title }}</span>
              <span class="figures"
                >{{ row.reading.value }} <span class="against">limit</span>
                {{ row.reading.limit }}</span
              >
            </div>
            <p class="detail">{{ row.check.detail }}</p>
            <p class="source">Source: {{ row.check.source }}</p>
          </div>
        </li>
      }
    </ul>
  `,
  styleUrl: './check-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CheckList {
  readonly checks = input.required<readonly SizingCheck[]>();
  readonly system = input<UnitSystem>('metric');

  protected readonly rows = computed(() =>
    this.checks().map((check) => ({
      key: `${check.check}:${check.subject}`,
      check,
      icon: STATUS_ICONS[check.status],
      reading: readCheck(check, this.system()),
    })),
  );
}
