import { useState } from 'react';
import type { SheetLayoutDto } from '@shared/schemas/labels';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import { CATEGORY_LABELS, STATUS_LABELS } from '@shared/tools/categories';
import { ItemPicker } from '@/components/ui/item-picker';
import { codesInListOrder } from '@/components/ui/item-picking';
import { Card } from '@/components/ui/page';
import { BIN_FACETS, binSearchText, type PickableBin } from '../utils/bin-selection';
import { PERSON_FACETS, personCode, personSearchText, pickedPersonIds, type PickablePerson } from '../utils/person-selection';
import { TOOL_FACETS, toolSearchText, type PickableTool } from '../utils/tool-selection';
import { LabelSheetForm } from './label-sheet-form';

type Source = 'tools' | 'bins' | 'people';

interface LabelSheetBuilderProps {
  tools: readonly PickableTool[];
  /** Stock bins to label too; without them the builder picks tools only. */
  bins?: readonly PickableBin[];
  /** People to print badges for (quartermaster and lead); printing one issues it anew. */
  people?: readonly PickablePerson[];
  /** People already chosen when the page opens (People's "Print badge" link); the builder then opens on People. */
  initialPeople?: readonly number[];
  layouts: readonly SheetLayoutDto[];
}

/**
 * Pick tools (and bins, and people's badges), choose the sheet, download the PDF. Tool labels come
 * first, then bins, then badges, each in list order.
 */
export function LabelSheetBuilder({ tools, bins, people, initialPeople = [], layouts }: LabelSheetBuilderProps) {
  const [source, setSource] = useState<Source>(people && initialPeople.length > 0 ? 'people' : 'tools');
  const [toolsPicked, setToolsPicked] = useState<Set<string>>(() => new Set());
  const [binsPicked, setBinsPicked] = useState<Set<string>>(() => new Set());
  const [peoplePicked, setPeoplePicked] = useState<Set<string>>(() => new Set(initialPeople.map(personCode)));
  const codes = [...codesInListOrder(tools, toolsPicked), ...(bins ? codesInListOrder(bins, binsPicked) : [])];
  const personIds = people ? pickedPersonIds(people, peoplePicked) : [];
  return (
    <div className="flex flex-col gap-4">
      <Card title={people ? '1. Pick tools, bins and people' : bins ? '1. Pick tools and bins' : '1. Pick the tools'}>
        {bins && (
          <div
            role="group"
            aria-label="What to label"
            className={`mb-4 grid gap-1 rounded-lg border-2 border-ink p-1 sm:inline-grid ${people ? 'grid-cols-3 sm:w-[36rem]' : 'grid-cols-2 sm:w-96'}`}
          >
            <SourceButton active={source === 'tools'} onClick={() => setSource('tools')} label="Tools" picked={toolsPicked.size} />
            <SourceButton active={source === 'bins'} onClick={() => setSource('bins')} label="Bins" picked={binsPicked.size} />
            {people && <SourceButton active={source === 'people'} onClick={() => setSource('people')} label="People" picked={peoplePicked.size} />}
          </div>
        )}
        {people && source === 'people' ? (
          <ItemPicker
            key="people"
            items={people}
            selected={peoplePicked}
            onChange={setPeoplePicked}
            noun={{ one: 'person', many: 'people' }}
            searchLabel="Search name"
            searchIn={personSearchText}
            facets={PERSON_FACETS}
            describe={describePerson}
          />
        ) : bins && source === 'bins' ? (
          <ItemPicker
            key="bins"
            items={bins}
            selected={binsPicked}
            onChange={setBinsPicked}
            noun={{ one: 'bin', many: 'bins' }}
            searchLabel="Search code, designation or place"
            searchIn={binSearchText}
            facets={BIN_FACETS}
            describe={describeBin}
          />
        ) : (
          <ItemPicker
            key="tools"
            items={tools}
            selected={toolsPicked}
            onChange={setToolsPicked}
            noun={{ one: 'tool', many: 'tools' }}
            searchLabel="Search code, name or place"
            searchIn={toolSearchText}
            facets={TOOL_FACETS}
            describe={describeTool}
          />
        )}
      </Card>
      <Card title="2. Choose the sheet and download">
        <LabelSheetForm
          layouts={layouts}
          codes={codes}
          people={personIds}
          nothingPicked={people ? 'No tools, bins or people picked yet.' : bins ? 'No tools or bins picked yet.' : undefined}
        />
      </Card>
    </div>
  );
}

const describeTool = (tool: PickableTool) => (
  <>
    <span className="block break-words">{tool.name}</span>
    <span className="block text-sm text-steel">
      {CATEGORY_LABELS[tool.category]} · {STATUS_LABELS[tool.status]}
    </span>
  </>
);

const describePerson = (person: PickablePerson) => (
  <>
    <span className="block break-words">{person.name}</span>
    <span className="block text-sm text-steel">{person.hasBadge ? 'Has a badge' : 'No badge yet'}</span>
  </>
);

const describeBin = (bin: PickableBin) => (
  <>
    <span className="block break-words">{bin.designation}</span>
    <span className="block text-sm text-steel">
      {BIN_KIND_LABELS[bin.kind]}
      {bin.location && ` · ${bin.location}`}
    </span>
  </>
);

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
