import type { Routes } from '@angular/router';

/** Routes under `/admin`, loaded lazily by the app routes. */
export const adminRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./admin-page').then((m) => m.AdminPage),
    title: 'Administration · Tidewright',
  },
];
