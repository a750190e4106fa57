import { TOOL_CODE_PATTERN } from '@shared/schemas/tools';
import { BIN_CODE_PATTERN } from '@shared/stock/kinds';

/**
 * What a station session may ask for: everything else answers 403 STATION_SCOPE. One line per
 * request, each naming the station screen that needs it. Paths are below /api; `:tool` and `:bin`
 * are a tool's and a bin's code, `:id` a number.
 */
export const STATION_ALLOW_LIST: readonly { method: string; path: string; screen: string }[] = [
  { method: 'GET', path: '/auth/me', screen: 'every screen: who is signed in' },
  { method: 'GET', path: '/auth/csrf', screen: 'every screen: the token for the next change' },
  { method: 'POST', path: '/station/sign-in', screen: 'badge screen: the next badge scanned' },
  { method: 'POST', path: '/station/replay-sign-in', screen: 'back online: the next badge whose queued actions are sent' },
  { method: 'GET', path: '/station/copy', screen: 'every screen: the offline copy, refreshed while online' },
  { method: 'GET', path: '/station/session', screen: 'every screen: the countdown' },
  { method: 'POST', path: '/station/done', screen: 'every screen: Done' },
  { method: 'GET', path: '/tools/:tool', screen: 'tool: opened by scan or code' },
  { method: 'GET', path: '/tools/:tool/events', screen: 'tool: its history' },
  { method: 'POST', path: '/tools/:tool/checkout', screen: 'tool: check out' },
  { method: 'POST', path: '/tools/:tool/return', screen: 'tool: return' },
  { method: 'POST', path: '/tools/:tool/photos', screen: 'tool: a photo with a return that needs attention' },
  { method: 'POST', path: '/tools/:tool/holds', screen: 'tool: hold' },
  { method: 'DELETE', path: '/tools/:tool/holds/mine', screen: 'tool: cancel my hold' },
  { method: 'GET', path: '/photos/:id', screen: 'tool: its photo, opened' },
  { method: 'GET', path: '/photos/:id/thumbnail', screen: 'tool: its photos' },
  { method: 'GET', path: '/signoffs/mine', screen: 'tool: whether my sign-offs allow a checkout' },
  { method: 'GET', path: '/loans/mine', screen: 'my loans: what to return' },
  { method: 'GET', path: '/bins/:bin', screen: 'bin: opened by scan or code' },
  { method: 'GET', path: '/bins/:bin/ledger', screen: 'bin: its ledger (others’ entries masked for a member)' },
  { method: 'GET', path: '/bins/:bin/reorder', screen: 'bin: what to order' },
  { method: 'POST', path: '/bins/:bin/draw', screen: 'bin: draw' },
  { method: 'POST', path: '/bins/:bin/return', screen: 'bin: return unused' },
  { method: 'GET', path: '/assemblies', screen: 'bin: my open assemblies to draw for' },
];

/**
 * What a replay session may ask for (POST /station/replay-sign-in opens one, with no PIN: the station
 * checked it against its copy when the actions were queued). Only the queued actions, and those only
 * as the queue sends them: `queued` requests must carry both Idempotency-Key and X-Performed-At.
 */
export const REPLAY_ALLOW_LIST: readonly { method: string; path: string; queued: boolean; screen: string }[] = [
  { method: 'GET', path: '/auth/me', queued: false, screen: 'replay: who the actions are sent for' },
  { method: 'GET', path: '/auth/csrf', queued: false, screen: 'replay: the token for the next action' },
  { method: 'POST', path: '/station/done', queued: false, screen: 'replay: this person’s queue is sent' },
  { method: 'POST', path: '/station/replay-sign-in', queued: false, screen: 'replay: the next person’s queue' },
  { method: 'POST', path: '/tools/:tool/checkout', queued: true, screen: 'replay: a check out made offline' },
  { method: 'POST', path: '/tools/:tool/return', queued: true, screen: 'replay: a return made offline' },
  { method: 'POST', path: '/bins/:bin/draw', queued: true, screen: 'replay: a draw made offline' },
  { method: 'POST', path: '/bins/:bin/return', queued: true, screen: 'replay: a return unused made offline' },
];

const inner = (pattern: RegExp) => pattern.source.replace(/^\^/, '').replace(/\$$/, '');
const SEGMENTS: Record<string, string> = { ':tool': inner(TOOL_CODE_PATTERN), ':bin': inner(BIN_CODE_PATTERN), ':id': '\\d+' };

const pathPattern = (path: string) => new RegExp(`^${path.replace(/:[a-z]+/g, (name) => SEGMENTS[name]!)}/?$`, 'i');
const matchers = STATION_ALLOW_LIST.map(({ method, path }) => ({ method, pattern: pathPattern(path) }));
const replayMatchers = REPLAY_ALLOW_LIST.map(({ method, path, queued }) => ({ method, queued, pattern: pathPattern(path) }));

/** Whether a station session may make this request (`path` below /api, without the query). */
export function stationMayRequest(method: string, path: string): boolean {
  return matchers.some((m) => m.method === method && m.pattern.test(path));
}

/**
 * Whether a replay session may make this request; `queuedHeaders` says whether it carries both
 * Idempotency-Key and X-Performed-At (their values are checked by the action itself).
 */
export function replayMayRequest(method: string, path: string, queuedHeaders: boolean): boolean {
  return replayMatchers.some((m) => m.method === method && m.pattern.test(path) && (!m.queued || queuedHeaders));
}
