import { Router } from 'express';
import { estimate, isEstimateErrors } from '@shared/estimate/estimate';
import { estimateBodySchema, type EstimateResponse } from '@shared/schemas/estimate';
import { HttpError } from '../../lib/http-error';
import { parseInput } from '../../lib/validate';
import { requireRole } from '../../middleware/auth';
import { readPlanningSettings } from '../../settings/planning-settings';

/**
 * POST /api/estimate: the fastener burn of a set of rivet lines, for anyone signed in. A line the
 * rules refuse makes the whole answer a 400 with that rule's code and every refused line listed.
 */
export function estimateRouter() {
  const router = Router();
  router.use(requireRole('member'));
  router.post('/', (req, res) => {
    const body = parseInput(estimateBodySchema, req.body);
    const planning = readPlanningSettings(req.ctx.db);
    const result = estimate(body, { defaultWastePercent: planning.wastePercent, maxPitchDiameters: planning.maxPitchDiameters });
    if (isEstimateErrors(result)) {
      const first = result.errors[0]!;
      throw new HttpError(
        400,
        first.code,
        result.errors.map((e) => e.message).join(' '),
        result.errors.map((e) => ({ path: `lines.${e.line}`, message: e.message })),
      );
    }
    const answer: EstimateResponse = { lines: result.lines, totals: result.totals, warnings: result.warnings, cautions: result.cautions };
    res.json(answer);
  });
  return router;
}
