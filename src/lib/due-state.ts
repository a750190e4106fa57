import { dueState, type DueState } from '@shared/time/chapter-time';
import { chapterTimeZone } from './chapter-zone';

/** "due today", "due in 3 days", "2 days late": chapter days, by the one rule the Overdue page and reminders use. */
export const dueStateOf = (dueAt: string | Date, now: Date = new Date()): DueState => dueState(new Date(dueAt), now, chapterTimeZone());
