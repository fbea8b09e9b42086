import type { Routes } from '@angular/router';

/** Routes under `/systems`, loaded lazily by the app routes. */
export const systemsRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./system-list/system-list').then((m) => m.SystemList),
    title: 'Systems · Tidewright',
  },
];
