import type { Routes } from '@angular/router';

/** Routes under `/systems/:systemId/measurements`, loaded lazily by the app routes. */
export const measurementsRoutes: Routes = [
  {
    path: '',
    loadComponent: () =>
      import('./measurements-page/measurements-page').then((m) => m.MeasurementsPage),
    title: 'Measurements · Tidewright',
  },
  {
    path: ':measurementId/compare',
    loadComponent: () =>
      import('./measurement-compare/measurement-compare').then((m) => m.MeasurementCompare),
    title: 'Measured and simulated · Tidewright',
  },
];
