/** Analyses: the stateless flux-channel solve and stored per-variant solves. */
import { Router } from 'express';
import { variantResultsQuerySchema, variantSolveSchema } from '@shared/schemas/solve';
import { authorize, requireUserId } from '../../lib/permissions';
import { validate } from '../../lib/validate';
import { answerJson, solveVariant, storedVariantResult } from './solveService';
import { runEngineTask } from '../../lib/workerPool';

/** Build the solve router. */
export function solveRouter(): Router {
  const r = Router();

  r.post('/solve/channel', async (req, res) => {
    requireUserId(req);
    res.json(await runEngineTask({ kind: 'channel', body: req.body }));
  });

  r.post('/variants/:vid/solve', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'analysis.run');
    const { scenarioId, maps } = validate(variantSolveSchema, req.body);
    res.type('application/json').send(answerJson(await solveVariant(a, a.variantId!, scenarioId, maps ?? false)));
  });

  r.get('/variants/:vid/results', async (req, res) => {
    const a = await authorize(req, 'variant', req.params.vid, 'workspace.read');
    const { scenarioId, maps } = validate(variantResultsQuerySchema, req.query);
    res.type('application/json').send(answerJson(await storedVariantResult(a.variantId!, scenarioId, maps)));
  });

  return r;
}
