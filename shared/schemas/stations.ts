import { z } from 'zod';
import { userSchema } from './auth';
import { catalogueBinSchema, catalogueToolSchema, offlineAssemblySchema, offlineLoanSchema } from './offline';

/**
 * The crib station: a shared tablet at the crib door where a member signs in with a badge and a PIN.
 * These are the contracts both sides use.
 */

/** 4 to 8 digits: short enough to type with gloves on, kept as an argon2id hash like a password. */
export const pinField = z.string().regex(/^\d{4,8}$/, { error: 'A PIN is 4 to 8 digits.' });

/** PUT /api/me/pin */
export const setPinBodySchema = z.strictObject({ pin: pinField });

/** POST /api/users/:id/badge → 201: the new badge's token, shown once (it is what the QR code holds). */
export const issuedBadgeSchema = z.strictObject({ badge: z.string().min(1) });

/** The station's own header: the token the enrolled browser keeps. */
export const STATION_TOKEN_HEADER = 'X-Station-Token';

/** How long a station session lasts without a scan or tap, and when the screen starts counting down. */
export const STATION_IDLE_SECONDS = 60;
export const STATION_COUNTDOWN_SECONDS = 10;
/** Wrong PINs for one badge at one station within the window lock that badge there for the window. */
export const STATION_PIN_TRIES = 5;
export const STATION_LOCK_MINUTES = 15;

export const stationNameField = z.string().trim().min(1, { error: 'Give the station a name.' }).max(60, { error: 'A station name is at most 60 characters.' });

/** POST /api/stations */
export const enrolStationBodySchema = z.strictObject({ name: stationNameField });

/** POST /api/stations → 201: the token is shown once, to the browser that keeps it. */
export const enrolledStationSchema = z.strictObject({ id: z.number().int(), name: z.string(), stationToken: z.string().min(1) });

/** GET /api/stations (quartermaster and lead). */
export const stationSchema = z.strictObject({
  id: z.number().int(),
  name: z.string(),
  enrolledAt: z.iso.datetime(),
  enrolledBy: z.string(),
  revokedAt: z.iso.datetime().nullable(),
});
export const stationListSchema = z.strictObject({ data: z.array(stationSchema) });

/** POST /api/station/sign-in (with the station token header). */
export const stationSignInBodySchema = z.strictObject({ badge: z.string().trim().min(1, { error: 'Scan a badge.' }), pin: pinField });

/** POST /api/station/sign-in → 200: who is signed in at which station, and when the session ends if idle. */
export const stationSessionSchema = z.strictObject({
  user: userSchema,
  station: z.strictObject({ id: z.number().int(), name: z.string() }),
  idleSeconds: z.number().int(),
});

export type SetPinBody = z.infer<typeof setPinBodySchema>;
export type IssuedBadge = z.infer<typeof issuedBadgeSchema>;
export type EnrolStationBody = z.infer<typeof enrolStationBodySchema>;
export type EnrolledStation = z.infer<typeof enrolledStationSchema>;
export type Station = z.infer<typeof stationSchema>;
export type StationSignInBody = z.infer<typeof stationSignInBodySchema>;
export type StationSession = z.infer<typeof stationSessionSchema>;

/**
 * A badge's token as printed in its QR code: 43 characters of base64url (256 random bits). A scan
 * that is neither a label nor this shape is refused at once, before any PIN is asked for.
 */
export const BADGE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** A SHA-256 in hex: how the station's copy names a badge (the token itself is only on the badge). */
export const sha256HexField = z.string().regex(/^[0-9a-f]{64}$/);

/**
 * One person in the station's copy: a working badge (by its token's SHA-256), the PIN's argon2id hash
 * (PHC string, null when none is set), and what their offline checks need: their loans, sign-offs,
 * open assemblies and what they have drawn from each bin and not returned.
 */
export const stationCopyPersonSchema = z.strictObject({
  id: z.number().int(),
  name: z.string(),
  role: userSchema.shape.role,
  badgeHash: sha256HexField,
  pinHash: z.string().nullable(),
  loans: z.array(offlineLoanSchema),
  signoffs: z.array(z.number()),
  assemblies: z.array(offlineAssemblySchema),
  /** Bin code → amount drawn by this person and not returned; bins at zero are left out. */
  drawn: z.record(z.string(), z.number()),
});

/**
 * GET /api/station/copy (with the station token header; no person need be signed in): what a station
 * keeps to go on without the network. Tools and bins as in the phone's catalogue (a bin's `drawnByYou`
 * is 0 here: each person's is in `drawn`); people who hold a working badge, active ones only.
 */
export const stationCopySchema = z.strictObject({
  takenAt: z.string(),
  station: z.strictObject({ id: z.number().int(), name: z.string() }),
  tools: z.array(catalogueToolSchema),
  bins: z.array(catalogueBinSchema),
  people: z.array(stationCopyPersonSchema),
});

/**
 * POST /api/station/replay-sign-in (with the station token header): a session for the badge's holder
 * that may only send actions the station queued while offline (their PIN was checked against the
 * copy then). Answers as sign-in does; a revoked or unknown badge is 401 BADGE_NOT_RECOGNISED.
 */
export const stationReplaySignInBodySchema = z.strictObject({ badge: z.string().trim().min(1, { error: 'Scan a badge.' }) });

export type StationCopyPerson = z.infer<typeof stationCopyPersonSchema>;
export type StationCopy = z.infer<typeof stationCopySchema>;
export type StationReplaySignInBody = z.infer<typeof stationReplaySignInBodySchema>;
