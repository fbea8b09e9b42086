import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

/** What the confirmation asks. */
export interface ConfirmRequest {
  readonly title: string;
  readonly message: string;
  /** The confirming button's words, e.g. "Delete system". */
  readonly confirmLabel: string;
  /** True for actions that destroy something: the button takes the error colour. */
  readonly destructive?: boolean;
}

/**
 * A Material dialog asking to confirm one action, with "Cancel" focused first so that Enter
 * never destroys anything by accident. Open it with `confirmAction`.
 */
@Component({
  selector: 'tw-confirm-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>{{ request.title }}</h2>
    <mat-dialog-content
      ><p class="message">{{ request.message }}</p></mat-dialog-content
    >
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false">Cancel</button>
      <button
        mat-flat-button
        type="button"
        class="confirm"
        [class.destructive]="request.destructive"
        [mat-dialog-close]="true"
      >
        {{ request.confirmLabel }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .message {
      margin: 0;
      max-width: 32rem;
    }
    .destructive {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmDialog {
  protected readonly request = inject<ConfirmRequest>(MAT_DIALOG_DATA);
}

/** Opens the confirmation and resolves true only when the person confirms. */
export async function confirmAction(dialog: MatDialog, request: ConfirmRequest): Promise<boolean> {
  const ref = dialog.open<ConfirmDialog, ConfirmRequest, boolean>(ConfirmDialog, {
    data: request,
    autoFocus: 'first-tabbable',
  });
  return (await firstValueFrom(ref.afterClosed())) === true;
}
