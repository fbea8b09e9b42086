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
    path: ':id/window',
    loadComponent: () => import('../window/window-page').then((m) => m.WindowPage),
    title: 'Operating window · Tidewright',
  },
  {
    path: ':id/sizing',
    loadComponent: () => import('../sizing/sizing-page').then((m) => m.SizingPage),
    title: 'Sizing checks · Tidewright',
  },
  {
    path: ':id/build-sheet',
    loadComponent: () => import('../build-sheet/build-sheet-page').then((m) => m.BuildSheetPage),
    title: 'Build sheet · Tidewright',
  },
  {
    path: ':id',
    loadComponent: () => import('./system-editor/system-editor').then((m) => m.SystemEditor),
    title: 'System · Tidewright',
  },
];
