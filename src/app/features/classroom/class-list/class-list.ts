import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type { ClassListItem } from '../../../../../shared/contracts/classroom';
import { AuthState } from '../../../core/auth/auth-state';
import { ClassroomApi } from '../classroom-api';
import { problemMessage } from '../problem-message';

/**
 * `/classes`: the classes I teach (with a form for a new one and a link to my lesson library) and
 * the classes I attend.
 */
@Component({
  selector: 'tw-class-list',
  imports: [
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './class-list.html',
  styleUrl: './class-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClassList {
  private readonly api = inject(ClassroomApi);
  private readonly auth = inject(AuthState);
  private readonly router = inject(Router);

  protected readonly items = signal<readonly ClassListItem[]>([]);
  protected readonly loading = signal(true);
  protected readonly problem = signal<string | null>(null);
  protected readonly canTeach = computed(() =>
    ['instructor', 'admin'].includes(this.auth.role() ?? ''),
  );
  protected readonly teaching = computed(() =>
    this.items().filter((c) => c.myRole === 'instructor'),
  );
  protected readonly attending = computed(() => this.items().filter((c) => c.myRole === 'student'));
  protected readonly newClass = new FormGroup({
    name: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(200)],
    }),
  });

  constructor() {
    void this.load();
  }

  protected async createClass(): Promise<void> {
    const name = this.newClass.controls.name.value.trim();
    if (!name) {
      this.newClass.markAllAsTouched();
      return;
    }
    try {
      const created = await this.api.createClass(name);
      await this.router.navigate(['/classes', created.id]);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async load(): Promise<void> {
    try {
      this.items.set((await this.api.classes()).items);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    } finally {
      this.loading.set(false);
    }
  }
}
