import { Dexie, type EntityTable } from 'dexie';
import type { Catalogue, QueuedActionKind } from '@shared/schemas/offline';
import type { DrawBody, ReturnUnusedBody } from '@shared/schemas/bins';
import type { CheckoutBody, ReturnBody } from '@shared/schemas/tools';

/** The catalogue copy of one member, as the server gave it. Only the signed-in member's is kept. */
export interface StoredCatalogue {
  memberId: number;
  catalogue: Catalogue;
}

export type QueuedBody = CheckoutBody | ReturnBody | DrawBody | ReturnUnusedBody;

/** Why the server refused a queued action, and what the member can do about it. */
export interface Refusal {
  status: number;
  code: string;
  message: string;
  nextStep: string;
  at: string;
}

/**
 * An action done on the phone while the server was out of reach. `seq` is the order it was done
 * in, so the replay keeps it; `key` makes a repeated send harmless.
 */
export interface QueuedAction {
  seq: number;
  key: string;
  memberId: number;
  kind: QueuedActionKind;
  code: string;
  /** The tool's name or the bin's designation, to list it without the catalogue. */
  what: string;
  body: QueuedBody;
  /** When the member did it, by the phone's clock (ISO 8601). */
  performedAt: string;
  /** When the catalogue copy it was made from was taken (ISO 8601). */
  catalogueAt: string;
  state: 'waiting' | 'refused';
  refusal?: Refusal;
}

class OfflineDatabase extends Dexie {
  catalogues!: EntityTable<StoredCatalogue, 'memberId'>;
  actions!: EntityTable<QueuedAction, 'seq'>;

  constructor() {
    super('gripline-offline');
    this.version(1).stores({
      catalogues: 'memberId',
      actions: '++seq, &key, [memberId+state]',
    });
  }
}

/** The phone's own store for the offline copy and the queue (IndexedDB). */
export const offlineDb = new OfflineDatabase();
