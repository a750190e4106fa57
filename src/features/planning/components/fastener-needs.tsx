import type { EstimateResult } from '@shared/estimate/estimate';
import { diameterText, gripText, headText, RIVET_KIND_LABELS, rivetSetText } from '../utils/words';

/** What the bins must stock for the assembly, one line per kind of rivet, and the puller nosepieces or rivet sets. */
export function FastenerNeeds({ result }: { result: EstimateResult }) {
  return (
    <div className="flex flex-col gap-3">
      <div>
        <h3 className="text-sm font-semibold">Rivets by kind</h3>
        <ul className="mt-1 flex flex-col gap-1">
          {result.needs.map((need, i) => (
            <li key={i} className="text-base">
              {RIVET_KIND_LABELS[need.kind]}, {headText(need.head, need.kind)}
              {need.material ? `, ${need.material}` : ''} · {diameterText(need.diameter32)} · {need.kind === 'solid' ? '' : 'grip '}
              {gripText(need.kind, need.grip)}: <strong className="font-mono">{need.rivets}</strong> ({need.withWaste} with waste)
            </li>
          ))}
        </ul>
      </div>
      <div>
        <h3 className="text-sm font-semibold">Setting tools</h3>
        <ul className="mt-1 flex flex-col gap-1">
          {result.nosepieces.map((n) => (
            <li key={`${n.kind}-${n.diameter32}-${n.head}`}>
              {n.kind === 'blind' ? `Rivet puller with a ${diameterText(n.diameter32)} nosepiece` : `Rivet gun with a ${diameterText(n.diameter32)} ${rivetSetText(n.head)}`}
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
