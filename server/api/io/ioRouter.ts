/**
 * Import and export routes. Exports need read access (reviewers may export); imports need design
 * edit rights. Imports are validated completely before anything is written; a failed import saves nothing.
 *   GET  /variants/:vid/export.json                       model file (SI units, header with units and source)
 *   GET  /variants/:vid/export/matrix.csv?kind=&scenario=  influence | nodes | contribution matrix
 *   GET  /variants/:vid/export/temperatures.csv?scenario=  temperature table (all scenarios when absent)
 *   GET  /variants/:vid/export/netlist.cir?scenario=&model= SPICE netlist (model = auto | steady | foster)
 *   POST /assemblies/:aid/import                           model file → new variant (multipart "file" or JSON)
 *   POST /assemblies/:aid/import/floorplan                 floorplan CSV → new variant
 *   POST /import/floorplan/preview                         floorplan CSV → parts and line-numbered errors (saves nothing)
 *   POST /import/power-map                                 power-map CSV → grid of weights and errors (saves nothing)
 */
import { Router, type Response } from 'express';
import {
  csvPreviewSchema, floorplanImportSchema, matrixQuerySchema, modelImportSchema, netlistQuerySchema, readFloorplanCsv, readPowerMapCsv, scenarioQuerySchema,
  type FloorplanPreview, type PowerMapPreview,
} from '@shared/export';
import { authorize, requireUserId } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { ValidationError } from '../../lib/errors';
import * as service from './ioService';
import { CSV_UPLOAD, JSON_UPLOAD, readUpload } from './upload';

const types = { json: 'application/json; charset=utf-8', csv: 'text/csv; charset=utf-8', cir: 'text/plain; charset=utf-8' } as const;

function sendFile(res: Response, file: { stem: string; body: string }, suffix: string, type: keyof typeof types): void {
  res.attachment(`${file.stem}${suffix}`).type(types[type]).send(file.body);
}

function csvText(upload: { text: string | null }, body: { csv?: string }): string {
  const text = upload.text ?? body.csv;
  if (text == null) throw new ValidationError([{ path: 'file', message: 'Attach a .csv file or send its text as "csv".' }]);
  return text;
}

/** Build the import/export router. */
export function ioRouter(): Router {
  const r = Router();

  r.get('/variants/:vid/export.json', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    sendFile(res, await service.modelFile(a.variantId!), '.heatloom.json', 'json');
  });

  r.get('/variants/:vid/export/matrix.csv', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const q = validate(matrixQuerySchema, req.query);
    sendFile(res, await service.matrixFile(a.variantId!, q.kind, q.scenario), `-${q.kind}.csv`, 'csv');
  });

  r.get('/variants/:vid/export/temperatures.csv', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const q = validate(scenarioQuerySchema, req.query);
    sendFile(res, await service.temperaturesFile(a.variantId!, q.scenario), `-temperatures${q.scenario ? `-${q.scenario}` : ''}.csv`, 'csv');
  });

  r.get('/variants/:vid/export/netlist.cir', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const q = validate(netlistQuerySchema, req.query);
    sendFile(res, await service.netlistFile(a.variantId!, q.scenario, q.model), `${q.model === 'steady' ? '-steady' : ''}.cir`, 'cir');
  });

  r.post('/assemblies/:aid/import', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'design.edit');
    const upload = await readUpload(req, res, JSON_UPLOAD);
    const body = validate(modelImportSchema, upload.fields);
    const text = upload.text ?? body.text ?? null;
    res.status(201).json(await service.importModel(a, { text, model: body.model, name: body.name, note: body.note, filename: upload.filename }));
  });

  r.post('/assemblies/:aid/import/floorplan', async (req, res) => {
    const a = await authorize(req, 'assembly', req.params.aid, 'design.edit');
    const upload = await readUpload(req, res, CSV_UPLOAD);
    const body = validate(floorplanImportSchema, upload.fields);
    res.status(201).json(await service.importFloorplan(a, { ...body, csv: csvText(upload, body), filename: upload.filename }));
  });

  r.post('/import/floorplan/preview', async (req, res) => {
    requireUserId(req);
    const upload = await readUpload(req, res, CSV_UPLOAD);
    const preview: FloorplanPreview = readFloorplanCsv(csvText(upload, validate(csvPreviewSchema, upload.fields)));
    res.json(preview);
  });

  r.post('/import/power-map', async (req, res) => {
    requireUserId(req);
    const upload = await readUpload(req, res, CSV_UPLOAD);
    const preview: PowerMapPreview = readPowerMapCsv(csvText(upload, validate(csvPreviewSchema, upload.fields)));
    res.json(preview);
  });

  return r;
}
