import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { BinImportPanel } from '@/features/stock-import/components/bin-import-panel';
import { StockExportPanel } from '@/features/stock-import/components/stock-export-panel';
import { Card, PageHeader } from '@/components/ui/page';
import { requireRole } from './guards';

export const binImportLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireRole(queryClient, request, 'quartermaster');
  return null;
};

export function BinImportRoute() {
  return (
    <>
      <PageHeader title="Import and export bins" lead="Bring a list of bins in from a spreadsheet, or take the bins and the ledger out to one." />
      <div className="flex flex-col gap-5">
        <Card title="Import bins from a CSV file">
          <BinImportPanel />
        </Card>
        <Card title="Export">
          <StockExportPanel />
        </Card>
      </div>
    </>
  );
}
