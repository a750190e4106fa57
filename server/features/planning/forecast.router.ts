import { Router } from 'express';
import { forecastQuerySchema, updatePlanningSettingsBodySchema } from '@shared/schemas/forecast';
import { parseInput } from '../../lib/validate';
import { requireRole } from '../../middleware/auth';
import { readPlanningSettings, writePlanningSettings } from '../../settings/planning-settings';
import { actualWaste } from './actual-waste';
import { forecastList } from './forecast-list';

/** GET /api/forecast: each bin's next 26 weeks, for quartermasters and leads. */
export function forecastRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));
  router.get('/', (req, res) => {
    const { bins } = parseInput(forecastQuerySchema, req.query, 'query');
    res.json(forecastList(req.ctx, bins));
  });
  return router;
}

/** GET /api/waste: the waste measured on finished assemblies, for quartermasters and leads. */
export function wasteRouter() {
  const router = Router();
  router.use(requireRole('quartermaster'));
  router.get('/', (req, res) => {
    res.json(actualWaste(req.ctx));
  });
  return router;
}

/** /api/settings/planning: everyone may read the planning settings, a chapter lead changes them. */
export function planningSettingsRouter() {
  const router = Router();
  router.use(requireRole('member'));
  router.get('/', (req, res) => {
    res.json(readPlanningSettings(req.ctx.db));
  });
  router.patch('/', requireRole('lead'), (req, res) => {
    writePlanningSettings(req.ctx.db, parseInput(updatePlanningSettingsBodySchema, req.body));
    res.json(readPlanningSettings(req.ctx.db));
  });
  return router;
}
