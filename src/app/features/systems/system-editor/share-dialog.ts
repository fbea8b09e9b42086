import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { readApiError } from '../../../core/http/read-api-error';
import { SystemsApi } from '../systems-api';

/** Which system to share. */
export interface ShareDialogData {
  readonly systemId: string;
  readonly systemName: string;
}

/** Shares a system with another Tidewright user by e-mail, as viewer or editor (owner only). */
@Component({
  selector: 'tw-share-dialog',
  imports: [
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  template: `
    <h2 mat-dialog-title>Share "{{ data.systemName }}"</h2>
    <mat-dialog-content>
      <form [formGroup]="form" id="share-form" class="share" (ngSubmit)="share()">
        <mat-form-field>
          <mat-label>E-mail of their Tidewright account</mat-label>
          <input matInput type="email" formControlName="email" autocomplete="off" />
        </mat-form-field>
        <mat-form-field>
          <mat-label>They may</mat-label>
          <mat-select formControlName="access">
            <mat-option value="viewer">View it and its runs</mat-option>
            <mat-option value="editor">Edit and run it</mat-option>
          </mat-select>
        </mat-form-field>
      </form>
      @if (problem(); as message) {
        <p class="problem" role="alert">{{ message }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button
        mat-flat-button
        type="submit"
        form="share-form"
        [disabled]="form.invalid || sending()"
      >
        Share
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .share {
      display: flex;
      flex-direction: column;
      min-width: 22rem;
    }
    .problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShareDialog {
  protected readonly data = inject<ShareDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(SystemsApi);
  private readonly ref = inject<MatDialogRef<ShareDialog, string>>(MatDialogRef);
  protected readonly sending = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly form = new FormGroup({
    email: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.email],
    }),
    access: new FormControl<'viewer' | 'editor'>('viewer', { nonNullable: true }),
  });

  protected async share(): Promise<void> {
    if (this.form.invalid) return;
    this.sending.set(true);
    this.problem.set(null);
    try {
      const share = await this.api.share(this.data.systemId, this.form.getRawValue());
      this.ref.close(`Shared with ${share.name} as ${share.access}.`);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      const body = readApiError(error.error);
      this.problem.set(
        body?.error.fields?.[0]?.message ??
          body?.error.message ??
          'The system could not be shared. Try again in a moment.',
      );
    } finally {
      this.sending.set(false);
    }
  }
}
