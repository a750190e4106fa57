import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { labelBinsQueryOptions } from '@/features/labels/api/get-label-bins';
import { labelPeopleQueryOptions } from '@/features/labels/api/get-label-people';
import { labelToolsQueryOptions } from '@/features/labels/api/get-label-tools';
import { sheetLayoutsQueryOptions } from '@/features/labels/api/get-layouts';
import { LabelSheetBuilder } from '@/features/labels/components/label-sheet-builder';
import { pickablePeople } from '@/features/labels/utils/person-selection';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const labelsLoader = pageLoader('quartermaster', [sheetLayoutsQueryOptions(), labelToolsQueryOptions(), labelBinsQueryOptions(), labelPeopleQueryOptions()]);

export function LabelsRoute() {
  const { data: layouts } = useSuspenseQuery(sheetLayoutsQueryOptions());
  const { data: tools } = useSuspenseQuery(labelToolsQueryOptions());
  const { data: bins } = useSuspenseQuery(labelBinsQueryOptions());
  const { data: people } = useSuspenseQuery(labelPeopleQueryOptions());
  // People's "Print badge" opens Labels with that person chosen: /labels?person=12.
  const [search] = useSearchParams();
  const initialPeople = search
    .getAll('person')
    .map(Number)
    .filter((id) => people.some((p) => p.id === id));
  return (
    <>
      <PageHeader
        title="Labels"
        lead="Print QR labels for crib tools and stock bins, and people’s badges for the crib station: each label carries the code, large, and the tool’s name, the bin’s designation or the person’s name."
      />
      <LabelSheetBuilder tools={tools} bins={bins} people={pickablePeople(people)} initialPeople={initialPeople} layouts={layouts} />
    </>
  );
}
