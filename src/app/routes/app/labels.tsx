import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { labelToolsQueryOptions } from '@/features/labels/api/get-label-tools';
import { sheetLayoutsQueryOptions } from '@/features/labels/api/get-layouts';
import { LabelSheetBuilder } from '@/features/labels/components/label-sheet-builder';
import { PageHeader } from '@/components/ui/page';
import { requireRole } from './guards';

export const labelsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireRole(queryClient, request, 'quartermaster');
  await Promise.all([queryClient.ensureQueryData(sheetLayoutsQueryOptions()), queryClient.ensureQueryData(labelToolsQueryOptions())]);
  return null;
};

export function LabelsRoute() {
  const { data: layouts } = useSuspenseQuery(sheetLayoutsQueryOptions());
  const { data: tools } = useSuspenseQuery(labelToolsQueryOptions());
  return (
    <>
      <PageHeader title="Labels" lead="Print QR labels for crib tools: each label carries the tool's code, large, and its name." />
      <LabelSheetBuilder tools={tools} layouts={layouts} />
    </>
  );
}
