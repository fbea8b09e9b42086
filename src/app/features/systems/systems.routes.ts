import type { Routes } from '@angular/router';

/** Routes under `/systems`, loaded lazily by the app routes. */
export const systemsRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./systems-page').then((m) => m.SystemsPage),
    title: 'Systems · Tidewright',
  },
];
