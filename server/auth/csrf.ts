// CSRF protection for cookie-authenticated mutations: a per-session token (synchronizer pattern)
// sent back in the X-CSRF-Token header, plus an Origin check on every mutation.
import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import { AppError } from '../errors';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

export const newCsrfToken = () => randomBytes(32).toString('base64url');

function sameToken(a: string, b: string) {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

function originMatches(req: Request): boolean {
  const origin = req.get('origin');
  if (!origin) return true;
  try {
    return new URL(origin).host === req.get('host');
  } catch {
    return false;
  }
}

export function csrfGuard(req: Request, _res: Response, next: NextFunction) {
  if (safeMethods.has(req.method)) return next();
  if (!originMatches(req)) {
    return next(new AppError('csrf_failed', 'This request came from another site and was refused.', 403));
  }
  const expected = req.session?.csrfToken;
  if (!req.session?.userId || !expected) return next();
  const sent = req.get('x-csrf-token') ?? '';
  if (!sameToken(sent, expected)) {
    return next(
      new AppError('csrf_failed', 'The security token is missing or out of date. Reload the page and try again.', 403),
    );
  }
  next();
}
