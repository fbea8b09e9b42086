import type { Routes } from '@angular/router';

/** Routes under `/runs`, loaded lazily by the app routes. */
export const runsRoutes: Routes = [
  {
    path: 'compare',
    loadComponent: () => import('./run-compare/run-compare').then((m) => m.RunCompare),
    title: 'Compare runs · Tidewright',
  },
  {
    path: ':id',
    loadComponent: () => import('./run-page/run-page').then((m) => m.RunPage),
    title: 'Run · Tidewright',
  },
];
