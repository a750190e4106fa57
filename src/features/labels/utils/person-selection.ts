import type { LabelPerson } from '@shared/schemas/labels';
import { filterOptions } from '@/components/ui/filter-options';
import type { PickerFacet } from '@/components/ui/item-picking';

/** A person in the picker: the picker keys items by a code, so a person's is their id as "#12". */
export interface PickablePerson extends LabelPerson {
  code: string;
}

export const personCode = (id: number) => `#${id}`;

export function pickablePeople(people: readonly LabelPerson[]): PickablePerson[] {
  return people.map((p) => ({ ...p, code: personCode(p.id) }));
}

/** The ids of the picked people, in list order. */
export function pickedPersonIds(people: readonly PickablePerson[], picked: ReadonlySet<string>): number[] {
  return people.filter((p) => picked.has(p.code)).map((p) => p.id);
}

export const personSearchText = (p: PickablePerson) => [p.code, p.name];

const BADGE_STATES = ['has', 'none'] as const;

export const PERSON_FACETS: readonly PickerFacet<PickablePerson, 'badge'>[] = [
  { id: 'badge', label: 'Badge', options: filterOptions('Anyone', BADGE_STATES, (s) => (s === 'has' ? 'Has a badge' : 'No badge yet')), of: (p) => (p.hasBadge ? 'has' : 'none') },
];
