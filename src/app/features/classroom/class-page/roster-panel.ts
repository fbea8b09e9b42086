import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  inject,
  input,
  output,
  signal,
  effect,
} from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import type { Roster, Student } from '../../../../../shared/contracts/classroom';
import { confirmAction } from '../../../ui/confirm-dialog/confirm-dialog';
import { ClassroomApi } from '../classroom-api';
import { problemMessage } from '../problem-message';
import { splitAddresses } from './split-addresses';

/**
 * The instructor's roster of a class: students (each removable), invitations not yet accepted
 * (each withdrawable), and a box for e-mail addresses to invite.
 */
@Component({
  selector: 'tw-roster-panel',
  imports: [
    DatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
  ],
  templateUrl: './roster-panel.html',
  styleUrl: './roster-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RosterPanel {
  private readonly api = inject(ClassroomApi);
  private readonly dialog = inject(MatDialog);

  /** The class whose roster this is. */
  readonly classId = input.required<string>();
  /** Emitted when the number of students changed. */
  readonly changed = output<void>();

  protected readonly roster = signal<Roster | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly inviteForm = new FormGroup({
    addresses: new FormControl('', { nonNullable: true }),
  });

  constructor() {
    effect(() => void this.load(this.classId()));
  }

  protected async invite(): Promise<void> {
    const emails = splitAddresses(this.inviteForm.controls.addresses.value);
    this.notice.set(null);
    this.problem.set(null);
    if (emails.length === 0) {
      this.problem.set('Type one or more e-mail addresses, separated by commas or new lines.');
      return;
    }
    this.sending.set(true);
    try {
      const result = await this.api.invite(this.classId(), emails);
      const sent =
        result.invited.length > 0
          ? `Invitation e-mailed to ${result.invited.map((i) => i.email).join(', ')}.`
          : '';
      const skipped =
        result.alreadyMembers.length > 0
          ? ` Already in the class: ${result.alreadyMembers.join(', ')}.`
          : '';
      this.notice.set((sent + skipped).trim());
      this.inviteForm.reset();
      await this.load(this.classId());
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    } finally {
      this.sending.set(false);
    }
  }

  protected async remove(student: Student): Promise<void> {
    const confirmed = await confirmAction(this.dialog, {
      title: `Remove ${student.name}?`,
      message: `${student.name} will no longer see this class or its lessons. Their answers leave the reports; invite them again to bring them back.`,
      confirmLabel: 'Remove student',
      destructive: true,
    });
    if (!confirmed) return;
    await this.act(() => this.api.removeStudent(this.classId(), student.userId));
    this.changed.emit();
  }

  protected async withdraw(invitationId: string): Promise<void> {
    await this.act(() => this.api.revokeInvitation(this.classId(), invitationId));
  }

  private async act(action: () => Promise<void>): Promise<void> {
    this.problem.set(null);
    try {
      await action();
      await this.load(this.classId());
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async load(classId: string): Promise<void> {
    try {
      this.roster.set(await this.api.roster(classId));
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
