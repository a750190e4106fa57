import { Dexie, type EntityTable, type Table } from 'dexie';
import type { Catalogue, QueuedActionKind } from '@shared/schemas/offline';
import type { StationCopy } from '@shared/schemas/stations';
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
  /** Set on an action done at a crib station without the network; the phone's own queue leaves these alone. */
  station?: StationMark;
}

/** Where a station's queued action was done, and by whom: the badge signs its person in again for the replay. */
export interface StationMark {
  stationId: number;
  badge: string;
  personName: string;
}

/** The copy the offline forms work from: the phone's own, or the one a station composed for the person at it. */
export interface CopyInUse extends StoredCatalogue {
  station?: StationMark;
}

/** A crib station's copy of what it needs to go on offline (people by badge and PIN hash, tools, bins). */
export interface StoredStationCopy {
  stationId: number;
  copy: StationCopy;
}

/** Wrong PINs typed at this station while offline, per badge (by its hash), so a reload keeps a lock. */
export interface StationPinFailures {
  stationId: number;
  badgeHash: string;
  at: string[];
}

class OfflineDatabase extends Dexie {
  catalogues!: EntityTable<StoredCatalogue, 'memberId'>;
  actions!: EntityTable<QueuedAction, 'seq'>;
  stationCopies!: EntityTable<StoredStationCopy, 'stationId'>;
  stationPinFailures!: Table<StationPinFailures, [number, string]>;

  constructor() {
    super('gripline-offline');
    this.version(1).stores({
      catalogues: 'memberId',
      actions: '++seq, &key, [memberId+state]',
    });
    // The crib station's copy and its offline PIN tries; version 1's stores stay as they were.
    this.version(2).stores({
      stationCopies: 'stationId',
      stationPinFailures: '[stationId+badgeHash]',
    });
  }
}

/** The phone's (or station's) own store for the offline copies and the queue (IndexedDB). */
export const offlineDb = new OfflineDatabase();
