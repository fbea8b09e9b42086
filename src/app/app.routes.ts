import type { Routes } from '@angular/router';
import { roleGuard, signedOutGuard } from './core/auth/role-guard';

/** Loads the sign-in page, which is also the home page of a signed-out visitor. */
const loadSignIn = () => import('./features/auth/sign-in').then((m) => m.SignIn);

/** Top-level routes; every feature is lazy and guarded by role where it needs one. */
export const routes: Routes = [
  {
    path: '',
    pathMatch: 'full',
    canActivate: [signedOutGuard],
    loadComponent: loadSignIn,
    title: 'Tidewright',
  },
  {
    path: 'sign-in',
    canActivate: [signedOutGuard],
    loadComponent: loadSignIn,
    title: 'Sign in · Tidewright',
  },
  {
    path: 'register',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./features/auth/register').then((m) => m.Register),
    title: 'Create an account · Tidewright',
  },
  {
    path: 'forgot-password',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./features/auth/forgot-password').then((m) => m.ForgotPassword),
    title: 'Reset your password · Tidewright',
  },
  {
    // Open to anyone holding the e-mailed link, signed in or not.
    path: 'reset-password',
    loadComponent: () => import('./features/auth/reset-password').then((m) => m.ResetPassword),
    title: 'Choose a new password · Tidewright',
  },
  {
    // Before `systems` so that this longer path wins.
    path: 'systems/:systemId/measurements',
    canMatch: [roleGuard()],
    loadChildren: () =>
      import('./features/measurements/measurements.routes').then((m) => m.measurementsRoutes),
  },
  {
    path: 'systems',
    canMatch: [roleGuard()],
    loadChildren: () => import('./features/systems/systems.routes').then((m) => m.systemsRoutes),
  },
  {
    path: 'runs',
    canMatch: [roleGuard()],
    loadChildren: () => import('./features/runs/runs.routes').then((m) => m.runsRoutes),
  },
  {
    // Any signed-in user: instructors teach classes here and students reach the ones they are in.
    path: 'classes',
    canMatch: [roleGuard()],
    loadChildren: () =>
      import('./features/classroom/classroom.routes').then((m) => m.classroomRoutes),
  },
  {
    // The landing page of an e-mailed class invitation: open to signed-out visitors.
    path: 'join',
    loadChildren: () => import('./features/join/join.routes').then((m) => m.joinRoutes),
  },
  {
    path: 'admin',
    canMatch: [roleGuard('admin')],
    loadChildren: () => import('./features/admin/admin.routes').then((m) => m.adminRoutes),
  },
  {
    path: 'safety',
    loadComponent: () =>
      import('./ui/safety-cautions/safety-cautions').then((m) => m.SafetyCautions),
    title: 'Safety cautions · Tidewright',
  },
  {
    path: '**',
    loadComponent: () => import('./core/not-found/not-found').then((m) => m.NotFound),
    title: 'Not found · Tidewright',
  },
];
