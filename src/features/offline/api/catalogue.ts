import { catalogueSchema, type Catalogue } from '@shared/schemas/offline';
import { api } from '@/lib/api-client';
import { offlineDb, type StoredCatalogue } from '../db';

export const CATALOGUE_PATH = '/api/offline/catalogue';

/**
 * Fetches the signed-in member's catalogue copy and keeps it, replacing any other member's.
 * Answers undefined when the session belongs to someone other than `memberId` (the person changed).
 */
export async function refreshCatalogue(memberId: number): Promise<Catalogue | undefined> {
  const catalogue = catalogueSchema.parse(await api.getOrGiveUp<unknown>(CATALOGUE_PATH));
  if (catalogue.you.id !== memberId) return undefined;
  await offlineDb.transaction('rw', offlineDb.catalogues, async () => {
    await offlineDb.catalogues.where('memberId').notEqual(memberId).delete();
    await offlineDb.catalogues.put({ memberId, catalogue });
  });
  return catalogue;
}

/** The member's copy, if this phone has one. */
export async function readCatalogue(memberId: number): Promise<StoredCatalogue | undefined> {
  return offlineDb.catalogues.get(memberId);
}

/** Keeps only `memberId`'s copy (another person signed in on this phone). */
export async function forgetOtherCatalogues(memberId: number): Promise<void> {
  await offlineDb.catalogues.where('memberId').notEqual(memberId).delete();
}

/** Sign-out: no copy of the chapter's catalogue stays on the phone. */
export async function clearCatalogues(): Promise<void> {
  await offlineDb.catalogues.clear();
}

/**
 * Who last signed in on this phone and has not signed out: the owner of the one copy kept. Lets
 * the installed app open with no network; the server still checks the session when actions replay.
 */
export async function offlineMember(): Promise<Catalogue['you'] | undefined> {
  const copies = await offlineDb.catalogues.toArray();
  return copies.length === 1 ? copies[0]?.catalogue.you : undefined;
}
