import { diameterWords } from '@shared/estimate/length-words';
import { CATEGORY_LABELS, POWERED_CATEGORIES } from '@shared/tools/categories';
import type { Tool } from '@shared/schemas/tools';
import { Notice } from '@/components/ui/notice';
import { Code, PageHeading } from '@/components/ui/page';
import { formatDueDay } from '@/lib/format';
import { DueBadge } from './due-badge';
import { ToolStatusBadge } from './tool-status-badge';

/** What the tool is, where it lives and what state it is in: the top of the scanned tool's screen. */
export function ToolSummary({ tool }: { tool: Tool }) {
  const powered = POWERED_CATEGORIES.includes(tool.category);
  return (
    <section aria-labelledby="tool-name" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <p className="font-mono text-lg font-medium text-brass-deep">{tool.code}</p>
          <PageHeading id="tool-name" title={tool.name} tabTitle={`${tool.code} ${tool.name}`} className="leading-tight" />
          <p className="text-steel">{CATEGORY_LABELS[tool.category]}</p>
        </div>
        <ToolStatusBadge status={tool.status} />
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
        <dt className="text-steel">Lives at</dt>
        <dd className="font-medium">{tool.location || 'not set'}</dd>
        {tool.rivetDiameter32 !== null && (
          <>
            <dt className="text-steel">For rivet size</dt>
            <dd>
              <Code>{diameterWords(tool.rivetDiameter32)}</Code>
            </dd>
          </>
        )}
        {tool.drillSize && (
          <>
            <dt className="text-steel">{tool.category === 'countersink_cutter' ? 'Pilot' : 'Drill size'}</dt>
            <dd>
              <Code>{tool.drillSize.name}</Code> · <Code>{tool.drillSize.inch.toFixed(4)} in</Code> · <Code>{tool.drillSize.mm.toFixed(3)} mm</Code>
            </dd>
          </>
        )}
        {tool.traySize && (
          <>
            <dt className="text-steel">Tray</dt>
            <dd>
              <Code>{tool.traySize} in</Code> temporary fasteners, <Code>{tool.trayCapacity}</Code> when full
            </dd>
          </>
        )}
        {tool.loan && (
          <>
            <dt className="text-steel">With</dt>
            <dd className="flex flex-wrap items-center gap-2">
              <span className="font-medium">{tool.loan.holder.name}</span>
              <span>until {formatDueDay(tool.loan.dueAt)}</span>
              <DueBadge dueAt={tool.loan.dueAt} />
            </dd>
          </>
        )}
        {tool.holds.offeredTo && (
          <>
            <dt className="text-steel">Held for</dt>
            <dd>{tool.holds.offeredTo.name}</dd>
          </>
        )}
        {tool.holds.waiting > 0 && (
          <>
            <dt className="text-steel">Waiting</dt>
            <dd>
              {tool.holds.waiting} {tool.holds.waiting === 1 ? 'person' : 'people'}
            </dd>
          </>
        )}
        <dt className="text-steel">Loan period</dt>
        <dd>{tool.loanDays} days</dd>
        {tool.requiredSignoff && (
          <>
            <dt className="text-steel">Sign-off</dt>
            <dd>{tool.requiredSignoff.name}</dd>
          </>
        )}
        {tool.statusNote && (
          <>
            <dt className="text-steel">Note</dt>
            <dd>{tool.statusNote}</dd>
          </>
        )}
      </dl>
      {tool.accessories.length > 0 && (
        <div>
          <h2 className="font-semibold">Travels with it</h2>
          <ul className="mt-1 list-disc pl-5">
            {tool.accessories.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
        </div>
      )}
      {powered && (
        <Notice tone="warn" title="Powered tool">
          Wear eye and hearing protection. Use it only after the chapter has signed you off, and follow the tool maker's instructions and
          the kit's plans.
        </Notice>
      )}
    </section>
  );
}
