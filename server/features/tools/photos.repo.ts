import { eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { loans, photos } from '../../db/schema/tools';

export type NewPhotoRow = typeof photos.$inferInsert;

export function insertPhoto(db: Executor, values: NewPhotoRow): { id: number } {
  return db.insert(photos).values(values).returning({ id: photos.id }).get();
}

export function findPhotoInfo(db: Executor, id: number): { id: number; toolId: number } | undefined {
  return db.select({ id: photos.id, toolId: photos.toolId }).from(photos).where(eq(photos.id, id)).get();
}

export function findPhotoBytes(db: Executor, id: number, size: 'image' | 'thumbnail'): Buffer | undefined {
  const column = size === 'image' ? photos.image : photos.thumbnail;
  return db.select({ bytes: column }).from(photos).where(eq(photos.id, id)).get()?.bytes;
}

/** A loan that pointed at the photo keeps its return record, without the picture. */
export function deletePhotoRow(db: Executor, id: number): void {
  db.update(loans).set({ returnPhotoId: null }).where(eq(loans.returnPhotoId, id)).run();
  db.delete(photos).where(eq(photos.id, id)).run();
}
