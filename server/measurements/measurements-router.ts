/** `/api/systems/:id/measurements`, `/api/measurements/:mid` and calibrations: the web layer only. */
import { Router, type Request } from 'express';
import {
  CompareQuerySchema,
  MeasurementSeriesQuerySchema,
} from '../../shared/contracts/measurements';
import type { AppContext } from '../app-context';
import { currentUser } from '../auth/session-user';
import { requireAuth } from '../http/require-auth';
import { parseOr400 } from '../http/validate';
import { calibrationRunnerFor } from './calibration/calibration-runner';
import {
  applyCalibrationById,
  clearCalibration,
  getCurrentCalibration,
  listCalibrations,
  startCalibration,
} from './calibration-service';
import { compareMeasurement } from './comparison-service';
import { readCsvUpload, receiveCsvUpload } from './csv-upload';
import {
  createCsvMeasurement,
  createStopwatchMeasurement,
  previewCsv,
} from './measurement-import-service';
import {
  deleteMeasurement,
  getMeasurement,
  getMeasurementSeries,
  getOriginalFile,
  getRejectedRows,
  listMeasurements,
} from './measurements-service';

const param = (req: Request, name: string): string => String(req.params[name] ?? '');

/** Upload, preview, list, read, compare and delete measurements; fit, list, apply and clear calibrations. */
export function measurementsRouter(ctx: AppContext): Router {
  const router = Router();
  const { db } = ctx;
  router.use(
    [
      '/systems/:systemId/measurements',
      '/systems/:systemId/calibrations',
      '/systems/:systemId/calibration',
      '/measurements',
      '/calibrations',
    ],
    requireAuth,
  );

  router.post('/systems/:systemId/measurements/preview', receiveCsvUpload, async (req, res) => {
    const { file, options } = readCsvUpload(req);
    res.json(await previewCsv(db, currentUser(req), param(req, 'systemId'), file, options));
  });
  router.post('/systems/:systemId/measurements/stopwatch', async (req, res) => {
    const measurement = await createStopwatchMeasurement(
      db,
      currentUser(req),
      param(req, 'systemId'),
      req.body,
    );
    res.status(201).location(`/api/measurements/${measurement.id}`).json(measurement);
  });
  router.post('/systems/:systemId/measurements', receiveCsvUpload, async (req, res) => {
    const { file, options } = readCsvUpload(req);
    const measurement = await createCsvMeasurement(
      db,
      currentUser(req),
      param(req, 'systemId'),
      file,
      options,
    );
    res.status(201).location(`/api/measurements/${measurement.id}`).json(measurement);
  });
  router.get('/systems/:systemId/measurements', async (req, res) => {
    res.json(await listMeasurements(db, currentUser(req), param(req, 'systemId')));
  });
  router.get('/measurements/:measurementId', async (req, res) => {
    res.json(await getMeasurement(db, currentUser(req), param(req, 'measurementId')));
  });
  router.get('/measurements/:measurementId/series', async (req, res) => {
    const { maxPoints } = parseOr400(MeasurementSeriesQuerySchema, req.query);
    res.json(
      await getMeasurementSeries(db, currentUser(req), param(req, 'measurementId'), maxPoints),
    );
  });
  router.get('/measurements/:measurementId/rejected', async (req, res) => {
    res.json(await getRejectedRows(db, currentUser(req), param(req, 'measurementId')));
  });
  router.get('/measurements/:measurementId/original', async (req, res) => {
    const { filename, bytes } = await getOriginalFile(
      db,
      currentUser(req),
      param(req, 'measurementId'),
    );
    res.attachment(filename).type('application/octet-stream').send(bytes);
  });
  router.get('/measurements/:measurementId/compare', async (req, res) => {
    const query = parseOr400(CompareQuerySchema, req.query);
    res.json(await compareMeasurement(db, currentUser(req), param(req, 'measurementId'), query));
  });
  router.delete('/measurements/:measurementId', async (req, res) => {
    await deleteMeasurement(db, currentUser(req), param(req, 'measurementId'));
    res.status(204).end();
  });

  const calibrationDeps = { db, runner: calibrationRunnerFor(ctx) };
  router.post('/systems/:systemId/calibrations', async (req, res) => {
    const calibration = await startCalibration(
      calibrationDeps,
      currentUser(req),
      param(req, 'systemId'),
      req.body,
    );
    res.status(201).json(calibration);
  });
  router.get('/systems/:systemId/calibrations', async (req, res) => {
    res.json(await listCalibrations(db, currentUser(req), param(req, 'systemId')));
  });
  router.get('/systems/:systemId/calibration', async (req, res) => {
    res.json(await getCurrentCalibration(db, currentUser(req), param(req, 'systemId')));
  });
  router.delete('/systems/:systemId/calibration', async (req, res) => {
    await clearCalibration(db, currentUser(req), param(req, 'systemId'));
    res.status(204).end();
  });
  router.post('/calibrations/:calibrationId/apply', async (req, res) => {
    res.json(await applyCalibrationById(db, currentUser(req), param(req, 'calibrationId')));
  });
  return router;
}
