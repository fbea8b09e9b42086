import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { OutboxMessage } from '../../../../shared/contracts/admin';
import { AdminApi } from './admin-api';
import { failureMessage } from './failure-message';
import { type TextSegment, linkSegments } from './link-segments';

/** An outbox message with its text split into clickable links. */
interface ShownMessage extends OutboxMessage {
  readonly segments: readonly TextSegment[];
}

/**
 * Mail the local SMTP server received (development, test and demo runs), newest first, as plain
 * text with clickable links, so a password reset or an invitation can be followed without a
 * real mailbox. HTML bodies are never rendered.
 */
@Component({
  selector: 'tw-outbox',
  imports: [DatePipe, MatButtonModule, MatExpansionModule, MatIconModule, MatProgressBarModule],
  templateUrl: './outbox.html',
  styleUrl: './outbox.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Outbox {
  private readonly api = inject(AdminApi);

  protected readonly messages = signal<ShownMessage[]>([]);
  protected readonly loading = signal(true);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    void this.refresh();
  }

  protected async refresh(): Promise<void> {
    this.loading.set(true);
    try {
      const messages = await this.api.listOutbox();
      this.messages.set(messages.map((m) => ({ ...m, segments: linkSegments(m.text) })));
      this.problem.set(null);
    } catch (error: unknown) {
      this.problem.set(failureMessage(error));
    } finally {
      this.loading.set(false);
    }
  }
}
