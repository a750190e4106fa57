import { toast } from 'sonner';
import type { QueuedActionKind } from '@shared/schemas/offline';
import type { CopyInUse, QueuedBody } from '../db';
import { describeAction } from '../utils/describe';
import { enqueue } from './queue';

/** Queues an action made from this copy (marked with the station when made at one) and tells the member it waits to be sent. */
export async function queueFromCopy(copy: CopyInUse, kind: QueuedActionKind, code: string, what: string, body: QueuedBody): Promise<void> {
  await enqueue({ memberId: copy.memberId, kind, code, what, body, catalogueAt: copy.catalogue.takenAt, ...(copy.station && { station: copy.station }) });
  toast.success(`${describeAction({ kind, code, body })} is waiting to send. It goes when the connection is back.`);
}
