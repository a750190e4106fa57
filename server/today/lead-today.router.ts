import { Router } from 'express';

/** `GET /api/today/lead`: what needs a lead today (filled in by the home-page work). */
export function leadTodayRouter() {
  const router = Router();
  return router;
}
