import { hasRole } from '@shared/roles';
import type { Build, createBuildBodySchema, updateBuildBodySchema } from '@shared/schemas/builds';
import type { z } from 'zod';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { assemblySummaries, findBuild, insertBuild, listBuilds, updateBuildRow, type BuildWithOwner } from './builds.repo';
import { toBuildDto } from './planning-dto';

/** A member's own builds and assemblies; a quartermaster or lead may read everyone's. */
export const mayRead = (user: UserRow, ownerId: number) => user.id === ownerId || hasRole(user.role, 'quartermaster');
/** Only the owner changes their plans, or a chapter lead. */
export const mayChange = (user: UserRow, ownerId: number) => user.id === ownerId || user.role === 'lead';

export function refuseRead(what: string, ownerName: string): HttpError {
  return new HttpError(403, 'FORBIDDEN', `This ${what} is ${ownerName}’s: only they, a quartermaster or a chapter lead can see it.`);
}
export function refuseChange(what: string, ownerName: string): HttpError {
  return new HttpError(403, 'FORBIDDEN', `This ${what} is ${ownerName}’s: only they or a chapter lead can change it.`);
}

function buildOrThrow(ctx: ServiceContext, id: number): BuildWithOwner {
  const found = findBuild(ctx.db, id);
  if (!found) throw new HttpError(404, 'BUILD_NOT_FOUND', `There is no build ${id}.`);
  return found;
}

/** The build, if the person may change it (to add assemblies or edit it). */
export function buildToChange(ctx: ServiceContext, user: UserRow, id: number): BuildWithOwner {
  const found = buildOrThrow(ctx, id);
  if (!mayChange(user, found.build.ownerId)) throw refuseChange('build', found.ownerName);
  return found;
}

function dtos(ctx: ServiceContext, rows: BuildWithOwner[]): Build[] {
  const parts = assemblySummaries(
    ctx.db,
    rows.map((r) => r.build.id),
  );
  return rows.map((r) =>
    toBuildDto(
      r.build,
      r.ownerName,
      parts.filter((p) => p.buildId === r.build.id),
    ),
  );
}

export function listBuildsFor(ctx: ServiceContext, user: UserRow, all: boolean): Build[] {
  if (all && !hasRole(user.role, 'quartermaster')) {
    throw new HttpError(403, 'FORBIDDEN', 'Only a quartermaster or a chapter lead can list everyone’s builds.');
  }
  return dtos(ctx, listBuilds(ctx.db, all ? undefined : user.id));
}

export function getBuild(ctx: ServiceContext, user: UserRow, id: number): Build {
  const found = buildOrThrow(ctx, id);
  if (!mayRead(user, found.build.ownerId)) throw refuseRead('build', found.ownerName);
  return dtos(ctx, [found])[0]!;
}

export function createBuild(ctx: ServiceContext, user: UserRow, body: z.output<typeof createBuildBodySchema>): Build {
  const build = insertBuild(ctx.db, { ownerId: user.id, name: body.name, description: body.description, edgeFloorIn: body.edgeFloorIn, createdAt: ctx.now() });
  return toBuildDto(build, user.name, []);
}

export function updateBuild(ctx: ServiceContext, user: UserRow, id: number, body: z.output<typeof updateBuildBodySchema>): Build {
  const found = buildToChange(ctx, user, id);
  return dtos(ctx, [{ ...found, build: updateBuildRow(ctx.db, id, body) }])[0]!;
}
