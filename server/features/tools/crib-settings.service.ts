import type { CribSettingsView, UpdateCribSettingsBody } from '@shared/schemas/signoffs';
import type { ServiceContext } from '../../context';
import { readChapterTimeZone, writeChapterTimeZone } from '../../settings/chapter-time-zone';
import { readCribSettings, writeCribSetting } from '../../settings/crib-settings';

/** The crib's settings as everyone reads them: the hold time and the chapter's time zone. */
export function cribSettingsView(ctx: ServiceContext): CribSettingsView {
  return { ...readCribSettings(ctx.db), timeZone: readChapterTimeZone(ctx.db) };
}

/**
 * A new hold time applies to the next offer; offers already made keep their expiry. A new time
 * zone moves the chapter's days from now on; due moments already set stay where they are.
 */
export function changeCribSettings(ctx: ServiceContext, { holdHours, timeZone }: UpdateCribSettingsBody): CribSettingsView {
  ctx.db.transaction((tx) => {
    if (holdHours !== undefined) writeCribSetting(tx, 'holdHours', holdHours);
    if (timeZone !== undefined) writeChapterTimeZone(tx, timeZone);
  });
  return cribSettingsView(ctx);
}
