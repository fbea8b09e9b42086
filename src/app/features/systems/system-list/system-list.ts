import { DatePipe } from '@angular/common';
import { HttpErrorResponse } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatMenuModule } from '@angular/material/menu';
import { MatPaginator, MatPaginatorModule } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { FieldError } from '../../../../../shared/contracts/api-error';
import type { SystemListItem } from '../../../../../shared/contracts/systems';
import { formatQuantity } from '../../../../../shared/scenario';
import { readApiError } from '../../../core/http/read-api-error';
import { confirmAction } from '../../../ui/confirm-dialog/confirm-dialog';
import { saveBlob } from '../../../ui/time-series-chart/save-blob';
import { statusWords } from '../../runs/verdict-words';
import { SystemsApi } from '../systems-api';
import { UnitPreference } from '../unit-preference';
import { UnitToggle } from '../unit-toggle';
import { type NewSystemChoice, NewSystemDialog } from './new-system-dialog';
import { systemSortValue } from './system-sort-value';

/** A scenario file that the server refused, with each problem by field. */
interface ImportProblem {
  readonly fileName: string;
  readonly message: string;
  readonly fields: readonly FieldError[];
}

/**
 * `/systems`: my systems and those shared with me in a sortable, filterable, paged table; new
 * from a template, import and export of scenario files, duplicate and delete.
 */
@Component({
  selector: 'tw-system-list',
  imports: [
    DatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatMenuModule,
    MatPaginatorModule,
    MatProgressBarModule,
    MatSortModule,
    MatTableModule,
    RouterLink,
    UnitToggle,
  ],
  templateUrl: './system-list.html',
  styleUrl: './system-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SystemList {
  private readonly api = inject(SystemsApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly units = inject(UnitPreference);

  protected readonly columns = ['name', 'beds', 'pump', 'verdict', 'updatedAt', 'actions'];
  protected readonly rows = signal<readonly SystemListItem[]>([]);
  protected readonly loading = signal(true);
  protected readonly loadError = signal<string | null>(null);
  protected readonly importProblem = signal<ImportProblem | null>(null);
  protected readonly dataSource = new MatTableDataSource<SystemListItem>([]);
  protected readonly empty = computed(() => !this.loading() && this.rows().length === 0);
  protected readonly statusWords = statusWords;

  private readonly sort = viewChild(MatSort);
  private readonly paginator = viewChild(MatPaginator);

  constructor() {
    this.dataSource.sortingDataAccessor = systemSortValue;
    this.dataSource.filterPredicate = (row, filter) =>
      `${row.name} ${row.ownerName} ${row.pumpSummary}`.toLowerCase().includes(filter);
    effect(() => {
      this.dataSource.data = [...this.rows()];
    });
    effect(() => {
      this.dataSource.sort = this.sort() ?? null;
      this.dataSource.paginator = this.paginator() ?? null;
    });
    void this.load();
  }

  /** The pump column in the reader's units ("1 pump, up to 33.3 L/min"). */
  protected pumpText(row: SystemListItem): string {
    if (row.pumpsCount === 0) return 'No pump';
    const pumps = `${row.pumpsCount} ${row.pumpsCount === 1 ? 'pump' : 'pumps'}`;
    if (row.pumpsMaxFlowM3PerS === null) return pumps;
    return `${pumps}, up to ${formatQuantity(row.pumpsMaxFlowM3PerS, 'flow', this.units.system())}`;
  }

  protected applyFilter(event: Event): void {
    this.dataSource.filter = (event.target as HTMLInputElement).value.trim().toLowerCase();
    this.dataSource.paginator?.firstPage();
  }

  protected async createSystem(): Promise<void> {
    const ref = this.dialog.open<NewSystemDialog, undefined, NewSystemChoice | null>(
      NewSystemDialog,
      { width: '34rem' },
    );
    const choice = await firstValueFrom(ref.afterClosed());
    if (!choice) return;
    await this.act(async () => {
      const system = await this.api.create({ template: choice.template, name: choice.name });
      await this.router.navigate(['/systems', system.id]);
    });
  }

  protected async duplicate(row: SystemListItem): Promise<void> {
    await this.act(async () => {
      const copy = await this.api.duplicate(row.id);
      this.snackBar.open(`Made "${copy.name}".`, undefined, { duration: 4000 });
      await this.load();
    });
  }

  protected async exportScenario(row: SystemListItem): Promise<void> {
    await this.act(async () => {
      const file = await this.api.exportScenario(row.id);
      saveBlob(file.blob, file.fileName);
    });
  }

  protected async remove(row: SystemListItem): Promise<void> {
    const confirmed = await confirmAction(this.dialog, {
      title: `Delete "${row.name}"?`,
      message:
        'The system and all of its stored runs are deleted for you and for everyone it is shared with. This cannot be undone.',
      confirmLabel: 'Delete system',
      destructive: true,
    });
    if (!confirmed) return;
    await this.act(async () => {
      await this.api.remove(row.id);
      this.snackBar.open(`Deleted "${row.name}".`, undefined, { duration: 4000 });
      await this.load();
    });
  }

  protected async importFile(event: Event): Promise<void> {
    const input = event.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    this.importProblem.set(null);
    let document: unknown;
    try {
      document = JSON.parse(await file.text());
    } catch (error: unknown) {
      const detail = error instanceof Error ? error.message : String(error);
      this.importProblem.set({
        fileName: file.name,
        message: `The file is not valid JSON (${detail}). Export a scenario file and try again.`,
        fields: [],
      });
      return;
    }
    try {
      const system = await this.api.importScenario(document);
      await this.router.navigate(['/systems', system.id]);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      const body = readApiError(error.error);
      this.importProblem.set({
        fileName: file.name,
        message:
          body?.error.message ?? 'The server could not import the file. Try again in a moment.',
        fields: body?.error.fields ?? [],
      });
    }
  }

  protected dismissImportProblem(): void {
    this.importProblem.set(null);
  }

  private async load(): Promise<void> {
    this.loading.set(true);
    try {
      this.rows.set((await this.api.list()).items);
      this.loadError.set(null);
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      this.loadError.set(
        readApiError(error.error)?.error.message ??
          'The systems could not be loaded. Reload the page to try again.',
      );
    } finally {
      this.loading.set(false);
    }
  }

  /** Runs an action and shows an API failure in a snack bar instead of throwing. */
  private async act(action: () => Promise<void>): Promise<void> {
    try {
      await action();
    } catch (error: unknown) {
      if (!(error instanceof HttpErrorResponse)) throw error;
      const message =
        readApiError(error.error)?.error.message ?? 'That did not work. Try again in a moment.';
      this.snackBar.open(message, 'Close', { duration: 8000 });
    }
  }
}
