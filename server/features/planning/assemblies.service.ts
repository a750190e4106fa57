import { hasRole } from '@shared/roles';
import type { Assembly, AssemblyStatus, CreateAssemblyInput, UpdateAssemblyBody } from '@shared/schemas/builds';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { countEntriesNamingAssembly } from '../stock/stock.reads';
import { deleteAssemblyRow, findAssembly, insertAssembly, listAssemblies, updateAssemblyRow, type AssemblyInBuild, type NewAssemblyRow } from './assemblies.repo';
import { buildToChange, mayChange, mayRead, refuseChange, refuseRead } from './builds.service';
import { dateToDay, dayToDate, toAssemblyDto } from './planning-dto';

function assemblyOrThrow(ctx: ServiceContext, id: number): AssemblyInBuild {
  const found = findAssembly(ctx.db, id);
  if (!found) throw new HttpError(404, 'ASSEMBLY_NOT_FOUND', `There is no assembly ${id}.`);
  return found;
}

/** The assembly, if the person may read it (its owner, a quartermaster or a lead). */
export function assemblyToRead(ctx: ServiceContext, user: UserRow, id: number): AssemblyInBuild {
  const found = assemblyOrThrow(ctx, id);
  if (!mayRead(user, found.build.ownerId)) throw refuseRead('assembly', found.ownerName);
  return found;
}

/** The assembly, if the person may change it (its owner or a lead). */
export function assemblyToChange(ctx: ServiceContext, user: UserRow, id: number): AssemblyInBuild {
  const found = assemblyOrThrow(ctx, id);
  if (!mayChange(user, found.build.ownerId)) throw refuseChange('assembly', found.ownerName);
  return found;
}

function row(body: Partial<CreateAssemblyInput>): Partial<NewAssemblyRow> {
  const { plannedStart, plannedFinish, lines, extraItems, ...rest } = body;
  return {
    ...rest,
    ...(plannedStart !== undefined && { plannedStart: dayToDate(plannedStart) }),
    ...(plannedFinish !== undefined && { plannedFinish: dayToDate(plannedFinish) }),
    ...(lines !== undefined && { lines: JSON.stringify(lines) }),
    ...(extraItems !== undefined && { extraItems: JSON.stringify(extraItems) }),
  };
}

export function createAssembly(ctx: ServiceContext, user: UserRow, buildId: number, body: CreateAssemblyInput): Assembly {
  buildToChange(ctx, user, buildId);
  const now = ctx.now();
  const created = insertAssembly(ctx.db, { ...row(body), name: body.name, buildId, createdAt: now, updatedAt: now });
  return toAssemblyDto(assemblyOrThrow(ctx, created.id));
}

export function listAssembliesFor(ctx: ServiceContext, user: UserRow, q: { status?: AssemblyStatus; mine: boolean }): Assembly[] {
  const everyone = hasRole(user.role, 'quartermaster') && !q.mine;
  return listAssemblies(ctx.db, { ownerId: everyone ? undefined : user.id, status: q.status }).map(toAssemblyDto);
}

export function getAssembly(ctx: ServiceContext, user: UserRow, id: number): Assembly {
  return toAssemblyDto(assemblyToRead(ctx, user, id));
}

export function updateAssembly(ctx: ServiceContext, user: UserRow, id: number, body: UpdateAssemblyBody): Assembly {
  const { assembly } = assemblyToChange(ctx, user, id);
  // The body checks its own dates; a change of one date must also fit the other one already stored.
  const start = body.plannedStart !== undefined ? body.plannedStart : dateToDay(assembly.plannedStart);
  const finish = body.plannedFinish !== undefined ? body.plannedFinish : dateToDay(assembly.plannedFinish);
  if (start && finish && finish < start) {
    const message = `The planned finish (${finish}) cannot be before the planned start (${start}).`;
    throw new HttpError(400, 'VALIDATION_FAILED', message, [{ path: 'plannedFinish', message }]);
  }
  updateAssemblyRow(ctx.db, id, { ...row(body), updatedAt: ctx.now() });
  return toAssemblyDto(assemblyOrThrow(ctx, id));
}

/** An assembly that stock was drawn for stays: the ledger names it. */
export function deleteAssembly(ctx: ServiceContext, user: UserRow, id: number): void {
  const { assembly } = assemblyToChange(ctx, user, id);
  const entries = countEntriesNamingAssembly(ctx.db, id);
  if (entries > 0) {
    throw new HttpError(
      409,
      'ASSEMBLY_HAS_DRAWS',
      `${assembly.name} cannot be deleted: ${entries} ledger ${entries === 1 ? 'entry names' : 'entries name'} it. Mark it done instead.`,
    );
  }
  deleteAssemblyRow(ctx.db, id);
}
