import type { Routes } from '@angular/router';

/** Routes under `/systems`, loaded lazily by the app routes. */
export const systemsRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./system-list/system-list').then((m) => m.SystemList),
    title: 'Systems · Tidewright',
  },
  {
    path: ':id/runs',
    loadComponent: () => import('../runs/run-list/run-list').then((m) => m.RunList),
    title: 'Runs · Tidewright',
  },
  {
    path: ':id',
    loadComponent: () => import('./system-editor/system-editor').then((m) => m.SystemEditor),
    title: 'System · Tidewright',
  },
];
