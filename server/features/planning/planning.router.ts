import { Router } from 'express';
import { noFieldsBodySchema } from '@shared/schemas/fields';
import {
  assemblyIdParams,
  assemblyListQuerySchema,
  buildIdParams,
  buildListQuerySchema,
  createAssemblyBodySchema,
  createBuildBodySchema,
  preferredUnitBodySchema,
  updateAssemblyBodySchema,
  updateBuildBodySchema,
} from '@shared/schemas/builds';
import { readPreferences, setPreferredUnit } from '../../accounts/preferences.service';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import { createAssembly, deleteAssembly, getAssembly, listAssembliesFor, updateAssembly } from './assemblies.service';
import { getAssemblyEstimate } from './assembly-estimate.service';
import { createBuild, getBuild, listBuildsFor, updateBuild } from './builds.service';
import { holdKit, type PlaceHold } from './kit-holds.service';

/** /api/builds: a member's builds, and new assemblies in them. */
export function buildsRouter() {
  const router = Router();
  const id = (params: unknown) => parseInput(buildIdParams, params, 'path').id;
  router.use(requireRole('member'));

  router.get('/', (req, res) => {
    res.json({ data: listBuildsFor(req.ctx, requireUser(req), parseInput(buildListQuerySchema, req.query, 'query').all) });
  });
  router.post('/', (req, res) => {
    res.status(201).json(createBuild(req.ctx, requireUser(req), parseInput(createBuildBodySchema, req.body)));
  });
  router.get('/:id', (req, res) => {
    res.json(getBuild(req.ctx, requireUser(req), id(req.params)));
  });
  router.patch('/:id', (req, res) => {
    res.json(updateBuild(req.ctx, requireUser(req), id(req.params), parseInput(updateBuildBodySchema, req.body)));
  });
  router.post('/:id/assemblies', (req, res) => {
    res.status(201).json(createAssembly(req.ctx, requireUser(req), id(req.params), parseInput(createAssemblyBodySchema, req.body)));
  });
  return router;
}

/** /api/assemblies: read and change assemblies, their estimate with bill and crib kit, and holds on the kit. */
export function assembliesRouter(deps: { placeHold: PlaceHold }) {
  const router = Router();
  const id = (params: unknown) => parseInput(assemblyIdParams, params, 'path').id;
  router.use(requireRole('member'));

  router.get('/', (req, res) => {
    res.json({ data: listAssembliesFor(req.ctx, requireUser(req), parseInput(assemblyListQuerySchema, req.query, 'query')) });
  });
  router.get('/:id', (req, res) => {
    res.json(getAssembly(req.ctx, requireUser(req), id(req.params)));
  });
  router.patch('/:id', (req, res) => {
    res.json(updateAssembly(req.ctx, requireUser(req), id(req.params), parseInput(updateAssemblyBodySchema, req.body)));
  });
  router.delete('/:id', (req, res) => {
    deleteAssembly(req.ctx, requireUser(req), id(req.params));
    res.status(204).end();
  });
  router.get('/:id/estimate', (req, res) => {
    res.json(getAssemblyEstimate(req.ctx, requireUser(req), id(req.params)));
  });
  router.post('/:id/kit/holds', (req, res) => {
    const assemblyId = id(req.params);
    parseInput(noFieldsBodySchema, req.body);
    res.status(201).json(holdKit(req.ctx, requireUser(req), assemblyId, deps.placeHold));
  });
  return router;
}

/** /api/me/preferences: the signed-in person's own settings (the length unit rivet lines are typed in). */
export function preferencesRouter() {
  const router = Router();
  router.use(requireRole('member'));
  router.get('/preferences', (req, res) => {
    res.json(readPreferences(requireUser(req)));
  });
  router.patch('/preferences', (req, res) => {
    const { preferredUnit } = parseInput(preferredUnitBodySchema, req.body);
    res.json(setPreferredUnit(req.ctx, requireUser(req), preferredUnit));
  });
  return router;
}
