import { useState } from 'react';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { Card } from '@/components/ui/page';
import type { PickableBin } from '../utils/bin-selection';
import { codesInListOrder, type PickableTool } from '../utils/tool-selection';
import { BinPicker } from './bin-picker';
import { LabelSheetForm } from './label-sheet-form';
import { ToolPicker } from './tool-picker';

type Source = 'tools' | 'bins';

interface LabelSheetBuilderProps {
  tools: readonly PickableTool[];
  /** Stock bins to label too; without them the builder picks tools only. */
  bins?: readonly PickableBin[];
  layouts: readonly SheetLayoutDto[];
}

/** Pick tools (and bins), choose the sheet, download the PDF. Tool labels come first, then bins, each in list order. */
export function LabelSheetBuilder({ tools, bins, layouts }: LabelSheetBuilderProps) {
  const [source, setSource] = useState<Source>('tools');
  const [toolsPicked, setToolsPicked] = useState<Set<string>>(() => new Set());
  const [binsPicked, setBinsPicked] = useState<Set<string>>(() => new Set());
  const codes = [...codesInListOrder(tools, toolsPicked), ...(bins ? codesInListOrder(bins, binsPicked) : [])];
  return (
    <div className="flex flex-col gap-4">
      <Card title={bins ? '1. Pick tools and bins' : '1. Pick the tools'}>
        {bins && (
          <div role="group" aria-label="What to label" className="mb-4 grid grid-cols-2 gap-1 rounded-lg border-2 border-ink p-1 sm:inline-grid sm:w-96">
            <SourceButton active={source === 'tools'} onClick={() => setSource('tools')} label="Tools" picked={toolsPicked.size} />
            <SourceButton active={source === 'bins'} onClick={() => setSource('bins')} label="Bins" picked={binsPicked.size} />
          </div>
        )}
        {bins && source === 'bins' ? (
          <BinPicker bins={bins} selected={binsPicked} onChange={setBinsPicked} />
        ) : (
          <ToolPicker tools={tools} selected={toolsPicked} onChange={setToolsPicked} />
        )}
      </Card>
      <Card title="2. Choose the sheet and download">
        <LabelSheetForm layouts={layouts} codes={codes} nothingPicked={bins ? 'No tools or bins picked yet.' : undefined} />
      </Card>
    </div>
  );
}

function SourceButton({ active, onClick, label, picked }: { active: boolean; onClick: () => void; label: string; picked: number }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      onClick={onClick}
      className={`min-h-12 rounded-md px-4 text-base font-semibold transition-colors ${active ? 'bg-ink text-card' : 'bg-card text-ink hover:bg-paper'}`}
    >
      {label}
      {picked > 0 && <span className="font-normal"> · {picked} picked</span>}
    </button>
  );
}
