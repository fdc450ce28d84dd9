import 'server-only';
import type { NextRequest } from 'next/server';
import { getEnv } from '@/lib/env';

/** The app's public address for links in e-mails and payment returns: NEXTAUTH_URL, else the request's. */
export function appOrigin(req: NextRequest): string {
  const configured = getEnv().NEXTAUTH_URL;
  return configured ? new URL(configured).origin : req.nextUrl.origin;
}

/** The caller's IP address as the proxy in front reports it, for the acceptance record. */
export function clientIp(req: NextRequest): string {
  const forwarded = req.headers.get('x-forwarded-for')?.split(',')[0]?.trim();
  return forwarded || req.headers.get('x-real-ip') || 'unknown';
}
