import { csrfSync } from 'csrf-sync';

/**
 * Synchroniser tokens kept in the session. Every POST/PUT/PATCH/DELETE under /api, sign-in
 * included, must send the token in X-CSRF-Token. Sign-in regenerates the session, which drops
 * the token, so sign-in mints a fresh one and returns it.
 */
export const csrf = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
  errorConfig: {
    statusCode: 403,
    code: 'CSRF_TOKEN_INVALID',
    message: 'This form has expired or came from elsewhere. Reload the page and try again.',
  },
});
