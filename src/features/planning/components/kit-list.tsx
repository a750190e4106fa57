import { Link } from 'react-router';
import type { KitItem } from '@shared/schemas/builds';
import { STATUS_LABELS, TOOL_STATUSES, type ToolCategory, type ToolStatus } from '@shared/tools/categories';
import { ToolCautions } from '@/components/ui/tool-cautions';
import { formatCount } from '@/lib/format';

const ROLE_LABELS: Record<KitItem['role'], string> = {
  puller: 'Rivet puller',
  rivet_gun: 'Rivet gun',
  nosepiece: 'Nosepiece',
  rivet_set: 'Rivet set',
  bucking_bar: 'Bucking bar',
  drill_bit: 'Drill bit',
  countersink_cutter: 'Countersink cutter',
  dimple_dies: 'Dimple dies',
  temporary_fastener_tray: 'Temporary fastener tray',
  deburring_tool: 'Deburring tool',
};

/** The kind of tool a kit item stands for when the crib has none to pick: the work still needs one. */
const ROLE_CATEGORIES: Record<KitItem['role'], ToolCategory> = {
  puller: 'hand_rivet_puller',
  rivet_gun: 'rivet_gun',
  nosepiece: 'hand_rivet_puller',
  rivet_set: 'rivet_gun',
  bucking_bar: 'bucking_bar',
  drill_bit: 'drill_bit',
  countersink_cutter: 'countersink_cutter',
  dimple_dies: 'dimple_dies',
  temporary_fastener_tray: 'temporary_fastener_tray',
  deburring_tool: 'deburring_tool',
};

const statusText = (status: string) => (status === 'held_for_you' ? 'held for you' : (TOOL_STATUSES as readonly string[]).includes(status) ? STATUS_LABELS[status as ToolStatus] : status);

/** The crib tools the assembly needs: which tool the crib has for each, whether it is free now, and the cautions for the kit's tools. */
export function KitList({ kit }: { kit: KitItem[] }) {
  if (kit.length === 0) return <p className="text-steel">No crib tools needed yet.</p>;
  return (
    <div className="flex flex-col gap-3">
      <ul className="flex flex-col gap-2">
        {kit.map((item, i) => (
          <li key={i} className="flex flex-col gap-1 rounded-lg border border-rule bg-card p-3">
            <p>
              <span className="font-semibold">{ROLE_LABELS[item.role]}</span>: {item.need}
              {item.count !== null && <span className="font-mono"> · {formatCount(item.count)}</span>}
            </p>
            {item.tool ? (
              <p className="text-sm">
                <Link to={`/tools/${item.tool.code}`} className="inline-flex min-h-12 items-center font-mono font-semibold underline underline-offset-4">
                  {item.tool.code}
                </Link>{' '}
                {item.tool.name} · <span className={item.tool.status === 'available' || item.tool.status === 'held_for_you' ? 'text-ok' : 'text-warn'}>{statusText(item.tool.status)}</span>
              </p>
            ) : null}
            {item.note && <p className="text-sm text-steel">{item.note}</p>}
          </li>
        ))}
      </ul>
      <ToolCautions categories={kit.map((item) => item.tool?.category ?? ROLE_CATEGORIES[item.role])} />
    </div>
  );
}
