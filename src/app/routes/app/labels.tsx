import { useSuspenseQuery } from '@tanstack/react-query';
import { labelBinsQueryOptions } from '@/features/labels/api/get-label-bins';
import { labelToolsQueryOptions } from '@/features/labels/api/get-label-tools';
import { sheetLayoutsQueryOptions } from '@/features/labels/api/get-layouts';
import { LabelSheetBuilder } from '@/features/labels/components/label-sheet-builder';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const labelsLoader = pageLoader('quartermaster', [sheetLayoutsQueryOptions(), labelToolsQueryOptions(), labelBinsQueryOptions()]);

export function LabelsRoute() {
  const { data: layouts } = useSuspenseQuery(sheetLayoutsQueryOptions());
  const { data: tools } = useSuspenseQuery(labelToolsQueryOptions());
  const { data: bins } = useSuspenseQuery(labelBinsQueryOptions());
  return (
    <>
      <PageHeader
        title="Labels"
        lead="Print QR labels for crib tools and stock bins: each label carries the code, large, and the tool's name or the bin's designation."
      />
      <LabelSheetBuilder tools={tools} bins={bins} layouts={layouts} />
    </>
  );
}
