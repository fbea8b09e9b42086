import type { Routes } from '@angular/router';
import { roleGuard } from '../../core/auth/role-guard';

/** Routes under `/classes`, loaded lazily by the app routes (any signed-in user). */
export const classroomRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./class-list/class-list').then((m) => m.ClassList),
    title: 'Classes · Tidewright',
  },
  {
    path: 'library',
    canActivate: [roleGuard('instructor', 'admin')],
    loadComponent: () => import('./lesson-library/lesson-library').then((m) => m.LessonLibrary),
    title: 'Lesson library · Tidewright',
  },
  {
    path: 'library/new',
    canActivate: [roleGuard('instructor', 'admin')],
    loadComponent: () => import('./lesson-editor/lesson-editor').then((m) => m.LessonEditor),
    title: 'New lesson · Tidewright',
  },
  {
    path: 'lessons/:lessonId',
    loadComponent: () => import('./lesson-page/lesson-page').then((m) => m.LessonPage),
    title: 'Lesson · Tidewright',
  },
  {
    path: 'lessons/:lessonId/edit',
    canActivate: [roleGuard('instructor', 'admin')],
    loadComponent: () => import('./lesson-editor/lesson-editor').then((m) => m.LessonEditor),
    title: 'Edit lesson · Tidewright',
  },
  {
    path: 'lessons/:lessonId/present',
    loadComponent: () =>
      import('./presentation/lesson-presentation').then((m) => m.LessonPresentation),
    title: 'Presenting · Tidewright',
  },
  {
    path: ':classId',
    loadComponent: () => import('./class-page/class-page').then((m) => m.ClassPage),
    title: 'Class · Tidewright',
  },
];
