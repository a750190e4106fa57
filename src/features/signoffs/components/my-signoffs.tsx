import { useQuery } from '@tanstack/react-query';
import { Card } from '@/components/ui/page';
import { mySignoffsQueryOptions } from '../api/get-my-signoffs';
import { formatGrantDate } from './format';

/** The signed-in person's own sign-offs; fetches them itself, so it can sit on any page. */
export function MySignoffs() {
  const mine = useQuery(mySignoffsQueryOptions());
  return (
    <Card title="Your sign-offs">
      {mine.isPending ? (
        <p className="text-steel">Loading your sign-offs…</p>
      ) : mine.isError ? (
        <p className="text-bad">Your sign-offs could not be loaded. {mine.error.message}</p>
      ) : mine.data.length === 0 ? (
        <p>You hold no sign-offs yet. A tool that needs one stays locked for you until a chapter lead signs you off.</p>
      ) : (
        <ul className="divide-y divide-rule">
          {mine.data.map((s) => (
            <li key={s.id} className="py-2">
              <div className="font-medium">{s.name}</div>
              <div className="text-sm text-steel">
                Signed off {formatGrantDate(s.grantedAt)} by {s.grantedBy.name}
              </div>
              {s.description && <div className="text-sm">{s.description}</div>}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-3 text-sm">Wear eye and hearing protection with every powered tool.</p>
    </Card>
  );
}
