import type { Routes } from '@angular/router';

/** `/join/:token`: the landing page of a class invitation, open to everyone. */
export const joinRoutes: Routes = [
  {
    path: ':token',
    loadComponent: () => import('./join-page').then((m) => m.JoinPage),
    title: 'Join a class · Tidewright',
  },
];
