import type { Catalogue, CatalogueBin, CatalogueTool } from '@shared/schemas/offline';

/** A tool as GET /api/offline/catalogue lists it: available, no sign-off needed, unless told. */
export function catalogueTool(code: string, over: Partial<CatalogueTool> = {}): CatalogueTool {
  return {
    code,
    name: 'Rivet spacing fan, 10 hole',
    category: 'spacing_fan',
    location: 'Wall rack',
    status: 'available',
    accessories: [],
    loanDays: 14,
    requiredSignoffId: null,
    requiredSignoffName: null,
    holder: null,
    dueAt: null,
    accessoriesOut: null,
    heldFor: null,
    traySize: null,
    trayCapacity: null,
    ...over,
  };
}

export function catalogueBin(code: string, over: Partial<CatalogueBin> = {}): CatalogueBin {
  return {
    code,
    kind: 'blind_structural',
    designation: '1/8 dome blind rivet, grip 2',
    location: 'Cabinet R, drawer 3',
    unit: 'each',
    onHand: 120,
    drawnByYou: 0,
    ...over,
  };
}

/** Marco's copy, taken at `takenAt`. */
export function catalogueFixture(over: Partial<Catalogue> = {}): Catalogue {
  return {
    takenAt: '2026-12-03T08:00:00.000Z',
    you: { id: 7, name: 'Marco Bellweather', role: 'member' },
    tools: [catalogueTool('T-0042'), catalogueTool('T-0043', { name: 'Air drill, 90 degree', category: 'air_drill', requiredSignoffId: 3, requiredSignoffName: 'Air tools' })],
    bins: [catalogueBin('B-0107')],
    yourLoans: [],
    yourSignoffs: [],
    yourAssemblies: [{ id: 8, name: 'Left elevator', buildName: 'Larkspur two-seater' }],
    ...over,
  };
}
