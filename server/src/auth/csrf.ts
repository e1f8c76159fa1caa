import { createHmac, randomBytes } from 'node:crypto';
import { csrfSync } from 'csrf-sync';
import type { Request } from 'express';

/** The cookie that binds an anonymous caller's CSRF token; it holds a random nonce, never a session. */
export const ANON_CSRF_COOKIE = 'mendery.csrf';

const cookieValue = (req: Request, name: string): string | undefined => {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const i = part.indexOf('=');
    if (i > 0 && part.slice(0, i).trim() === name) return decodeURIComponent(part.slice(i + 1).trim());
  }
  return undefined;
};

/**
 * Synchroniser tokens: a signed-in session keeps its token in the session row, as before. An anonymous caller
 * gets a token derived (HMAC with the session secret) from a random nonce in its own cookie, so fetching a token
 * writes no session row; a cross-site page can neither read the token nor forge one without the secret.
 */
export function csrfProtection(secret: string) {
  const anonToken = (nonce: string) => createHmac('sha256', secret).update(`csrf:${nonce}`).digest('hex');
  const signedIn = (req: Request) => Boolean(req.session?.userId);
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => req.headers['x-csrf-token'] as string | undefined,
    getTokenFromState: (req) => {
      if (signedIn(req)) return req.session.csrfToken;
      const nonce = cookieValue(req, ANON_CSRF_COOKIE);
      return nonce && /^[0-9a-f]{32}$/.test(nonce) ? anonToken(nonce) : undefined;
    },
    storeTokenInState: (req, token) => {
      if (signedIn(req)) req.session.csrfToken = token;
    },
  });
  const token = (req: Request): string => {
    if (signedIn(req)) return generateToken(req);
    const existing = cookieValue(req, ANON_CSRF_COOKIE);
    if (existing && /^[0-9a-f]{32}$/.test(existing)) return anonToken(existing);
    const nonce = randomBytes(16).toString('hex');
    req.res?.cookie(ANON_CSRF_COOKIE, nonce, {
      httpOnly: true,
      sameSite: 'lax',
      secure: req.secure,
      path: '/',
    });
    return anonToken(nonce);
  };
  return { csrfSynchronisedProtection, token };
}
