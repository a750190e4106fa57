import { Router } from 'express';
import { NUMBER_AND_LETTER_DRILLS } from '@shared/drills/drill-sizes';

/** Published reference tables; public, since they are the same for everyone. */
export function referenceRouter() {
  const router = Router();
  const drills = NUMBER_AND_LETTER_DRILLS.map(({ name, inch, mm }) => ({ name, inch, mm }));
  router.get('/drills', (_req, res) => {
    res.json(drills);
  });
  return router;
}
