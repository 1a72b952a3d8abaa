/**
 * `req.cookies` for csrf-csrf, which reads its cookie there. A dozen lines instead of another
 * package: split the Cookie header on `;`, keep the first value of each name, decode it.
 */
import type { RequestHandler } from 'express';

function decode(value: string): string {
  try {
    return decodeURIComponent(value);
  } catch {
    return value;
  }
}

export const parseCookies: RequestHandler = (req, _res, next) => {
  const cookies: Record<string, string> = {};
  for (const pair of (req.headers.cookie ?? '').split(';')) {
    const eq = pair.indexOf('=');
    if (eq < 0) continue;
    const name = pair.slice(0, eq).trim();
    let value = pair.slice(eq + 1).trim();
    if (value.startsWith('"') && value.endsWith('"')) value = value.slice(1, -1);
    if (name && !(name in cookies)) cookies[name] = decode(value);
  }
  req.cookies = cookies;
  next();
};
