import { Router } from 'express';

/** `GET /api/today/quartermaster`: what needs a quartermaster today (filled in by the home-page work). */
export function quartermasterTodayRouter() {
  const router = Router();
  return router;
}
