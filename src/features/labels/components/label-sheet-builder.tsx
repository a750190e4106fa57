import { useState } from 'react';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { Card } from '@/components/ui/page';
import { codesInListOrder, type PickableTool } from '../utils/tool-selection';
import { LabelSheetForm } from './label-sheet-form';
import { ToolPicker } from './tool-picker';

/** Pick tools, choose the sheet, download the PDF. */
export function LabelSheetBuilder({ tools, layouts }: { tools: readonly PickableTool[]; layouts: readonly SheetLayoutDto[] }) {
  const [selected, setSelected] = useState<Set<string>>(() => new Set());
  const codes = codesInListOrder(tools, selected);
  return (
    <div className="flex flex-col gap-4">
      <Card title="1. Pick the tools">
        <ToolPicker tools={tools} selected={selected} onChange={setSelected} />
      </Card>
      <Card title="2. Choose the sheet and download">
        <LabelSheetForm layouts={layouts} codes={codes} />
      </Card>
    </div>
  );
}
