import { Router } from 'express';
import { leadTodayRouter } from './lead-today.router';
import { memberTodayRouter } from './member-today.router';
import { quartermasterTodayRouter } from './quartermaster-today.router';

/**
 * Home's "what needs you today", one answer per role. This folder composes features (as app.ts
 * does): each figure comes from the owning feature's own function, the one its screen uses.
 */
export function todayRouter() {
  const router = Router();
  router.use('/member', memberTodayRouter());
  router.use('/quartermaster', quartermasterTodayRouter());
  router.use('/lead', leadTodayRouter());
  return router;
}
