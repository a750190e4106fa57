import { Router } from 'express';

/** `GET /api/today/member`: what needs a member today (filled in by the home-page work). */
export function memberTodayRouter() {
  const router = Router();
  return router;
}
