import type { Routes } from '@angular/router';

/** Routes under `/classes`, loaded lazily by the app routes. */
export const classesRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./classes-page').then((m) => m.ClassesPage),
    title: 'Classes · Tidewright',
  },
];
