import { Link } from 'react-router';
import type { IdleTool, MostUsedTool } from '@shared/schemas/loan-stats';
import { CATEGORY_LABELS } from '@shared/tools/categories';
import { FigureTable } from '@/components/ui/figure-table';
import { Code } from '@/components/ui/page';
import { formatCount, formatDay } from '@/lib/format';

function ToolLink({ tool }: { tool: { code: string; name: string } }) {
  return (
    <Link to={`/tools/${tool.code}`} className="inline-flex min-h-11 items-center gap-1.5 font-medium text-ink underline underline-offset-2">
      <span className="whitespace-nowrap">
        <Code>{tool.code}</Code>
      </span>{' '}
      {tool.name}
    </Link>
  );
}

/** The tools lent most in the weeks shown, with the days they were out. */
export function MostUsedTools({ tools, weeks }: { tools: MostUsedTool[]; weeks: number }) {
  return (
    <FigureTable
      caption={`Tools lent most in the last ${formatCount(weeks)} weeks, by loans`}
      columns={[
        { header: 'Tool', cell: (t) => <ToolLink tool={t} /> },
        { header: 'Kind', cell: (t) => CATEGORY_LABELS[t.category] },
        { header: 'Loans', numeric: true, cell: (t) => formatCount(t.loans) },
        { header: 'Days out', numeric: true, cell: (t) => formatCount(t.daysOut) },
      ]}
      rows={tools}
      rowKey={(t) => t.code}
      empty="No tool was lent in these weeks."
    />
  );
}

/** Tools nobody has borrowed for six months: candidates to sell or to move where they are wanted. */
export function IdleTools({ tools, since }: { tools: IdleTool[]; since: string }) {
  return (
    <FigureTable
      caption={`Tools not lent since ${formatDay(since)}, never lent first`}
      columns={[
        { header: 'Tool', cell: (t) => <ToolLink tool={t} /> },
        { header: 'Kind', cell: (t) => CATEGORY_LABELS[t.category] },
        { header: 'Last lent', cell: (t) => (t.lastLentAt ? formatDay(t.lastLentAt) : 'Never') },
        { header: 'In the crib since', cell: (t) => formatDay(t.addedAt) },
      ]}
      rows={tools}
      rowKey={(t) => t.code}
      empty="Every tool has been lent in the last six months."
    />
  );
}
