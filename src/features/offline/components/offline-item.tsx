import type { ReactNode } from 'react';
import type { Catalogue } from '@shared/schemas/offline';
import { Card, PageHeading } from '@/components/ui/page';
import type { CopyInUse, QueuedAction } from '../db';
import { useCatalogueCopy, useWaiting } from '../hooks';
import { NeedsConnection, NoOfflineCopy, NotInOfflineCopy, OfflineCopyNote } from './offline-copy-note';
import { WaitingHere } from './waiting-here';

/** Where a scanned code is looked up: the member's copy on the phone, or a copy made for them (at a crib station). */
export type CopySource = { memberId: number } | { copy: CopyInUse; waiting: QueuedAction[] | undefined };

interface FindProps<State> {
  code: string;
  kind: 'tool' | 'bin';
  find: (catalogue: Catalogue, code: string, waiting: QueuedAction[]) => State | undefined;
  children: (copy: CopyInUse, state: State) => ReactNode;
}

/**
 * Finds a scanned code in the copy, moved on by the member's waiting actions, and hands it to
 * `children`; says so while the copy opens, when there is none, or when the code is not in it.
 */
export function FromOfflineCopy<State>({ source, ...props }: FindProps<State> & { source: CopySource }) {
  return 'memberId' in source ? <FromPhoneCopy memberId={source.memberId} {...props} /> : <FoundInCopy copy={source.copy} waiting={source.waiting} {...props} />;
}

function FromPhoneCopy<State>({ memberId, ...props }: FindProps<State> & { memberId: number }) {
  const copy = useCatalogueCopy(memberId);
  const waiting = useWaiting(memberId);
  return <FoundInCopy copy={copy} waiting={waiting} {...props} />;
}

function FoundInCopy<State>({
  copy,
  waiting,
  code,
  kind,
  find,
  children,
}: FindProps<State> & { copy: CopyInUse | null | undefined; waiting: QueuedAction[] | undefined }) {
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
 * (`facts` add to the list), then what can be done offline and what needs the connection. At a crib
 * station it sits under the station's own greeting: a second-level heading that leaves the tab's title
 * and the focus alone, and words about the station rather than a phone.
 */
export function OfflineItemPage({
  copy,
  code,
  title,
  subtitle,
  location,
  facts,
  waiting,
  needsConnection,
  children,
}: {
  copy: CopyInUse;
  code: string;
  title: string;
  subtitle: string;
  location: string;
  facts: ReactNode;
  waiting: QueuedAction[];
  needsConnection: string;
  children: ReactNode;
}) {
  const atStation = copy.station !== undefined;
  return (
    <div className="flex flex-col gap-4">
      <OfflineCopyNote takenAt={copy.catalogue.takenAt} device={atStation ? 'station' : 'phone'} />
      <Card>
        <p className="font-mono text-lg font-medium text-brass-deep">{code}</p>
        {atStation ? (
          <h2 className="text-2xl leading-tight font-bold">{title}</h2>
        ) : (
          <PageHeading title={title} tabTitle={`${code} ${title}`} className="leading-tight" />
        )}
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
