import { isTimeZone } from '@shared/time/words';

/**
 * The chapter's time zone, in which the client writes every day and moment. The server says it at
 * sign-in and with /api/auth/me; it is kept on the device so a page opened offline, or before the
 * first answer, still counts the chapter's days. Until then, the device's own zone.
 */
const KEY = 'gripline.chapterTimeZone';
let zone: string | undefined;

const stored = (): string | undefined => {
  try {
    const value = globalThis.localStorage?.getItem(KEY) ?? undefined;
    return value && isTimeZone(value) ? value : undefined;
  } catch {
    return undefined;
  }
};

export function chapterTimeZone(): string {
  zone ??= stored() ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  return zone;
}

export function setChapterTimeZone(next: string): void {
  if (!isTimeZone(next)) return;
  zone = next;
  try {
    globalThis.localStorage?.setItem(KEY, next);
  } catch {
    // Private mode or a full store: the zone still holds for this page.
  }
}
