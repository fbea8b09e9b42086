import { ChangeDetectionStrategy, Component } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import type { SystemTemplate } from '../../../../../shared/contracts/systems';

/** What "New system" asks for. */
export interface NewSystemChoice {
  readonly template: SystemTemplate;
  readonly name: string;
}

/** The starting points, in the order offered, with what each holds. */
const TEMPLATES: readonly { value: SystemTemplate; title: string; detail: string; name: string }[] =
  [
    {
      value: 'greenhouse',
      title: 'Greenhouse, three beds with a sump',
      detail: 'A 500 L fish tank, a sump and three gravel beds of different sizes on one pump.',
      name: 'Greenhouse system',
    },
    {
      value: 'tabletop',
      title: 'Tabletop, one bed',
      detail: 'A small classroom unit: one tank, one bed with a bell siphon.',
      name: 'Tabletop system',
    },
    {
      value: 'timer-bed',
      title: 'Timer-driven bed',
      detail: 'A bed with a plain standpipe and a weep hole, flooded by a pump on a timer.',
      name: 'Timer-driven bed',
    },
    { value: 'blank', title: 'Blank', detail: 'A single tank to build on.', name: 'New system' },
  ];

/** Asks which template to start from and what to call the new system. */
@Component({
  selector: 'tw-new-system-dialog',
  imports: [
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatRadioModule,
    ReactiveFormsModule,
  ],
  templateUrl: './new-system-dialog.html',
  styles: `
    .templates {
      display: flex;
      flex-direction: column;
      gap: 0.5rem;
      margin: 0.5rem 0 1rem;
    }
    .detail {
      display: block;
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
    .name {
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewSystemDialog {
  protected readonly templates = TEMPLATES;
  protected readonly form = new FormGroup({
    template: new FormControl<SystemTemplate>('greenhouse', { nonNullable: true }),
    name: new FormControl('Greenhouse system', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(200)],
    }),
  });
  private nameTouchedByPerson = false;

  /** The choice to close with, or null while the name is missing. */
  protected choice(): NewSystemChoice | null {
    const { template, name } = this.form.getRawValue();
    return name.trim() ? { template, name: name.trim() } : null;
  }

  protected pickTemplate(template: SystemTemplate): void {
    const entry = TEMPLATES.find((t) => t.value === template);
    if (entry && !this.nameTouchedByPerson) this.form.controls.name.setValue(entry.name);
  }

  protected noteNameTyped(): void {
    this.nameTouchedByPerson = true;
  }
}
