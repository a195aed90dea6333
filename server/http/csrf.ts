import { csrfSync } from 'csrf-sync';

/**
 * Synchroniser-token CSRF defence (OWASP): the token lives in the server-side session, the
 * client sends it in the `x-csrf-token` header on every state-changing request. GET, HEAD and
 * OPTIONS pass. SameSite cookies are the second line.
 */
export const csrf = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
});
