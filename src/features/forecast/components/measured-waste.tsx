import { toast } from 'sonner';
import type { ActualWaste } from '@shared/schemas/forecast';
import { Button } from '@/components/ui/button';
import { ScrollTable } from '@/components/ui/scroll-table';
import { messageOf } from '@/lib/errors';
import { useUpdatePlanningSettings } from '../api/planning-settings';
import { formatCount, formatTenth } from '../utils/format';
import { wasteAllowanceFrom } from '../utils/planning-form';

/** The chapter's waste measured on finished assemblies, with a button that makes it the allowance. */
export function MeasuredWaste({ waste, onApplied }: { waste: ActualWaste; onApplied: (wastePercent: number) => void }) {
  const update = useUpdatePlanningSettings();
  const { chapter } = waste;
  if (chapter.wastePercent === null) {
    return <p className="text-sm text-steel">No finished assembly has estimates and draws to measure waste from yet.</p>;
  }
  const offer = wasteAllowanceFrom(chapter.wastePercent);
  const apply = () =>
    update.mutate(
      { wastePercent: offer },
      {
        onSuccess: (saved) => {
          onApplied(saved.wastePercent);
          toast.success(`Waste allowance set to ${formatTenth(saved.wastePercent)} %.`);
        },
        onError: (err) => toast.error(messageOf(err)),
      },
    );
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-rule bg-paper p-3 text-sm">
      <p>
        Measured on finished assemblies: <span className="font-mono font-semibold">{formatTenth(chapter.wastePercent)} %</span> ({formatCount(chapter.drawn)} drawn against{' '}
        {formatCount(chapter.estimated)} estimated).
      </p>
      {offer === waste.currentAllowance ? (
        <p className="text-steel">The allowance already matches what was measured.</p>
      ) : (
        <Button variant="secondary" busy={update.isPending} onClick={apply} className="self-start">
          Use measured waste ({formatTenth(offer)} %)
        </Button>
      )}
    </div>
  );
}

/** Waste per member, for the lead to see where the chapter's figure comes from. */
export function WasteByMember({ waste }: { waste: ActualWaste }) {
  if (waste.members.length === 0) return <p className="text-steel">No member has finished an assembly with draws yet.</p>;
  return (
    <ScrollTable label="Waste by member">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Waste by member</caption>
        <thead className="bg-paper">
          <tr>
            <th scope="col" className="px-3 py-2 font-semibold">
              Member
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Estimated
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Drawn
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Waste
            </th>
          </tr>
        </thead>
        <tbody>
          {waste.members.map((m) => (
            <tr key={m.member.id} className="border-t border-rule">
              <th scope="row" className="px-3 py-2 font-normal">
                {m.member.name}
              </th>
              <td className="px-3 py-2 text-right font-mono">{formatCount(m.estimated)}</td>
              <td className="px-3 py-2 text-right font-mono">{formatCount(m.drawn)}</td>
              <td className="px-3 py-2 text-right font-mono">{m.wastePercent === null ? '—' : `${formatTenth(m.wastePercent)} %`}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollTable>
  );
}
