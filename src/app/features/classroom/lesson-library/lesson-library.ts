import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { ClassListItem, LessonListItem } from '../../../../../shared/contracts/classroom';
import { confirmAction } from '../../../ui/confirm-dialog/confirm-dialog';
import { ClassroomApi } from '../classroom-api';
import { problemMessage } from '../problem-message';

/** `/classes/library`: my lessons in no class; copy one into a class, open, delete, or write a new one. */
@Component({
  selector: 'tw-lesson-library',
  imports: [
    DatePipe,
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatProgressBarModule,
    RouterLink,
  ],
  templateUrl: './lesson-library.html',
  styleUrl: './lesson-library.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LessonLibrary {
  private readonly api = inject(ClassroomApi);
  private readonly dialog = inject(MatDialog);

  protected readonly lessons = signal<readonly LessonListItem[] | null>(null);
  protected readonly classes = signal<readonly ClassListItem[]>([]);
  protected readonly teaching = computed(() =>
    this.classes().filter((c) => c.myRole === 'instructor'),
  );
  protected readonly notice = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    void this.load();
  }

  protected async copyInto(lesson: LessonListItem, target: ClassListItem): Promise<void> {
    await this.act(async () => {
      await this.api.duplicateLesson(lesson.id, { classId: target.id });
      this.notice.set(
        `"${lesson.title}" is now a draft in ${target.name}; publish it there when the class should see it.`,
      );
    });
  }

  protected async remove(lesson: LessonListItem): Promise<void> {
    const confirmed = await confirmAction(this.dialog, {
      title: `Delete "${lesson.title}"?`,
      message: 'The library copy is deleted. Copies already in classes stay.',
      confirmLabel: 'Delete lesson',
      destructive: true,
    });
    if (confirmed) await this.act(() => this.api.deleteLesson(lesson.id));
  }

  private async act(action: () => Promise<void>): Promise<void> {
    this.problem.set(null);
    this.notice.set(null);
    try {
      await action();
      await this.load();
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }

  private async load(): Promise<void> {
    try {
      const [library, classes] = await Promise.all([this.api.library(), this.api.classes()]);
      this.lessons.set(library.items);
      this.classes.set(classes.items);
    } catch (error: unknown) {
      this.problem.set(problemMessage(error));
    }
  }
}
