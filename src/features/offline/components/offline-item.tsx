import type { ReactNode } from 'react';
import type { Catalogue } from '@shared/schemas/offline';
import { Card, PageHeading } from '@/components/ui/page';
import type { QueuedAction, StoredCatalogue } from '../db';
import { useCatalogueCopy, useWaiting } from '../hooks';
import { NeedsConnection, NoOfflineCopy, NotInOfflineCopy, OfflineCopyNote } from './offline-copy-note';
import { WaitingHere } from './waiting-here';

/**
 * Finds a scanned code in the member's copy, moved on by their waiting actions, and hands it to
 * `children`; says so while the copy opens, when the phone has none, or when the code is not in it.
 */
export function FromOfflineCopy<State>({
  memberId,
  code,
  kind,
  find,
  children,
}: {
  memberId: number;
  code: string;
  kind: 'tool' | 'bin';
  find: (catalogue: Catalogue, code: string, waiting: QueuedAction[]) => State | undefined;
  children: (copy: StoredCatalogue, state: State) => ReactNode;
}) {
  const copy = useCatalogueCopy(memberId);
  const waiting = useWaiting(memberId);
  if (copy === undefined || waiting === undefined) return <p role="status">Opening the offline copy…</p>;
  if (copy === null) return <NoOfflineCopy code={code} />;
  const state = find(copy.catalogue, code, waiting);
  if (!state) {
    return <NotInOfflineCopy code={code} kind={kind} takenAt={copy.catalogue.takenAt} />;
  }
  return children(copy, state);
}

/**
 * A tool or bin page from the copy: the copy's age, a card with what it is and where it lives
 * (`facts` add to the list), then what can be done offline and what needs the connection.
 */
export function OfflineItemPage({
  takenAt,
  code,
  title,
  subtitle,
  location,
  facts,
  waiting,
  needsConnection,
  children,
}: {
  takenAt: string;
  code: string;
  title: string;
  subtitle: string;
  location: string;
  facts: ReactNode;
  waiting: QueuedAction[];
  needsConnection: string;
  children: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-4">
      <OfflineCopyNote takenAt={takenAt} />
      <Card>
        <p className="font-mono text-lg font-medium text-brass-deep">{code}</p>
        <PageHeading title={title} tabTitle={`${code} ${title}`} className="leading-tight" />
        <p className="text-steel">{subtitle}</p>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
          <dt className="text-steel">Lives at</dt>
          <dd className="font-medium">{location || 'not set'}</dd>
          {facts}
        </dl>
      </Card>
      <Card title="What you can do">
        <div className="flex flex-col gap-4">
          <WaitingHere waiting={waiting} />
          {children}
          <NeedsConnection what={needsConnection} />
        </div>
      </Card>
    </div>
  );
}
