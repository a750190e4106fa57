import { chapterDay } from '@shared/time/chapter-time';
import type { Assembly, AssemblyLine, Build, ExtraItem } from '@shared/schemas/builds';
import type { BuildRow } from '../../db/schema/builds';
import type { AssemblyInBuild } from './assemblies.repo';
import type { AssemblySummaryRow } from './builds.repo';

/**
 * Planned dates are chapter days by name: stored at the UTC midnight of the name (a label, not a
 * moment), read back as 2027-01-15, and compared with the chapter's today by name (the forecast
 * counts its weeks on these names).
 */
export const dayToDate = (day: string | null): Date | null => (day === null ? null : new Date(`${day}T00:00:00Z`));
export const dateToDay = (date: Date | null): string | null => (date === null ? null : chapterDay(date, 'UTC'));

/** Lines and extra items were checked by the shared schemas before they were stored. */
export const parseLines = (json: string) => JSON.parse(json) as AssemblyLine[];
export const parseExtraItems = (json: string) => JSON.parse(json) as ExtraItem[];

export function toAssemblyDto({ assembly: a, build, ownerName }: AssemblyInBuild): Assembly {
  return {
    id: a.id,
    buildId: build.id,
    buildName: build.name,
    owner: { id: build.ownerId, name: ownerName },
    name: a.name,
    status: a.status,
    plannedStart: dateToDay(a.plannedStart),
    plannedFinish: dateToDay(a.plannedFinish),
    unit: a.unit,
    lines: parseLines(a.lines),
    extraItems: parseExtraItems(a.extraItems),
    notes: a.notes,
    updatedAt: a.updatedAt.toISOString(),
  };
}

export function toBuildDto(build: BuildRow, ownerName: string, parts: AssemblySummaryRow[]): Build {
  return {
    id: build.id,
    owner: { id: build.ownerId, name: ownerName },
    name: build.name,
    description: build.description,
    edgeFloorIn: build.edgeFloorIn,
    assemblies: parts.map((p) => ({ id: p.id, name: p.name, status: p.status, plannedStart: dateToDay(p.plannedStart), plannedFinish: dateToDay(p.plannedFinish) })),
  };
}
