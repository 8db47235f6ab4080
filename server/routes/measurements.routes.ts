import multer from 'multer';
import { idParam } from '../../shared/schemas/api';
import { fitCalibrationSchema, UPLOAD_LIMITS, uploadFieldsSchema } from '../../shared/schemas/measurements';
import type { Db } from '../db/index';
import { HttpError } from '../http-error';
import { parseBody, parseParams } from '../middleware/validate';
import { activeTubeFactors, fitCalibration, listCalibrations } from '../services/calibrations.service';
import { getLot } from '../services/lots.service';
import { compareLot, listMeasurements, storeUpload } from '../services/measurements.service';
import { getTube } from '../services/tubes.service';
import { defineRoutes } from './define-routes';

/** One CSV file in memory, at most UPLOAD_LIMITS.maxBytes; anything else is refused before parsing. */
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_LIMITS.maxBytes, files: 1, fields: 10 },
  fileFilter: (_req, file, cb) => {
    const csvName = /\.(csv|txt)$/i.test(file.originalname);
    const textType = /^(text\/(csv|plain)|application\/(vnd\.ms-excel|csv|octet-stream))$/.test(file.mimetype);
    if (csvName && textType) return cb(null, true);
    cb(new HttpError(415, 'unsupported_file', 'Upload a CSV file (.csv)', [{ path: 'file', message: `${file.originalname} is not a CSV file` }]));
  },
});

export function measurementsRoutes(db: Db) {
  const r = defineRoutes('/api');

  r.get('/lots/:id/measurements', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    await getLot(db, id);
    const list = await listMeasurements(db, id);
    res.json({ data: { measurements: list, comparison: await compareLot(db, id, list) } });
  });

  r.post('/lots/:id/measurements', ['operator', 'engineer'], upload.single('file'), async (req, res) => {
    const { id } = parseParams(idParam, req);
    const fields = parseBody(uploadFieldsSchema, req);
    res.status(201).json({ data: await storeUpload(db, req.user!, id, fields, req.file) });
  });

  r.get('/tubes/:id/calibrations', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    await getTube(db, id);
    res.json({ data: await listCalibrations(db, id) });
  });

  r.post('/tubes/:id/calibrations', ['engineer', 'lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { note } = parseBody(fitCalibrationSchema, req);
    res.status(201).json({ data: await fitCalibration(db, req.user!, id, note) });
  });

  r.get('/calibrations/active', 'signed-in', async (_req, res) => {
    res.json({ data: await activeTubeFactors(db) });
  });

  return r;
}
