import { toast } from 'sonner';
import type { QueuedActionKind } from '@shared/schemas/offline';
import type { QueuedBody, StoredCatalogue } from '../db';
import { describeAction } from '../utils/describe';
import { enqueue } from './queue';

/** Queues an action made from this copy and tells the member it waits to be sent. */
export async function queueFromCopy(copy: StoredCatalogue, kind: QueuedActionKind, code: string, what: string, body: QueuedBody): Promise<void> {
  await enqueue({ memberId: copy.memberId, kind, code, what, body, catalogueAt: copy.catalogue.takenAt });
  toast.success(`${describeAction({ kind, code, body })} is waiting to send. It goes when the connection is back.`);
}
