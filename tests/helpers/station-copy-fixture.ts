import type { StationCopy, StationCopyPerson } from '@shared/schemas/stations';
import { hashLinkToken } from '../../server/accounts/link-tokens';
import { hashPassword } from '../../server/accounts/passwords';
import { catalogueBin, catalogueTool } from './catalogue-fixture';

/**
 * A person in the station's copy, hashed as the server hashes: the badge's SHA-256 by the server's
 * own function, the PIN by its argon2id (so the station's checks meet the server's real hashes).
 */
export async function copyPerson(id: number, name: string, badge: string, pin: string | null, over: Partial<StationCopyPerson> = {}): Promise<StationCopyPerson> {
  return {
    id,
    name,
    role: 'member',
    badgeHash: hashLinkToken(badge),
    pinHash: pin === null ? null : await hashPassword(pin),
    loans: [],
    signoffs: [],
    assemblies: [],
    drawn: {},
    ...over,
  };
}

/** The copy GET /api/station/copy answers for station 4, with the catalogue fixture's tools and bins. */
export function stationCopyFixture(people: StationCopyPerson[], over: Partial<StationCopy> = {}): StationCopy {
  return {
    takenAt: new Date(Date.now() - 2 * 60_000).toISOString(),
    station: { id: 4, name: 'Crib door tablet' },
    tools: [catalogueTool('T-0042'), catalogueTool('T-0043', { name: 'Air drill, 90 degree', category: 'air_drill', requiredSignoffId: 3, requiredSignoffName: 'Air tools' })],
    bins: [catalogueBin('B-0107')],
    people,
    ...over,
  };
}
