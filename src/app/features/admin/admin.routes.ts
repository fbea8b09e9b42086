import type { Routes } from '@angular/router';

/** Routes under `/admin` (admin role, guarded by the app routes): users and the outbox. */
export const adminRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./admin-page').then((m) => m.AdminPage),
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'users' },
      {
        path: 'users',
        loadComponent: () => import('./user-table').then((m) => m.UserTable),
        title: 'Users · Administration · Tidewright',
      },
      {
        path: 'outbox',
        loadComponent: () => import('./outbox').then((m) => m.Outbox),
        title: 'Outbox · Administration · Tidewright',
      },
    ],
  },
];
