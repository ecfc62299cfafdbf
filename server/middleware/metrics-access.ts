import { BlockList, isIPv4 } from 'node:net';
import type { RequestHandler } from 'express';
import type { User } from '../../shared/schemas/auth';
import { AppError } from '../errors';

const LOOPBACK = new BlockList();
LOOPBACK.addSubnet('127.0.0.0', 8, 'ipv4');
LOOPBACK.addAddress('::1', 'ipv6');

/** 127.0.0.0/8 and ::1, also as IPv4 mapped into IPv6 (::ffff:127.0.0.1), as a dual-stack socket reports it. */
export function isLoopback(address: string | undefined): boolean {
  if (!address) return false;
  const plain = address.toLowerCase().startsWith('::ffff:') && isIPv4(address.slice(7)) ? address.slice(7) : address;
  return LOOPBACK.check(plain, isIPv4(plain) ? 'ipv4' : 'ipv6');
}

/**
 * Who may read /metrics: a caller on this machine (a scraper or agent beside the server), by the
 * socket's own address — never X-Forwarded-For, which any client can write — or a signed-in admin.
 */
export function metricsAccess(remoteAddress: string | undefined, user: User | undefined): 'allowed' | 401 | 403 {
  if (isLoopback(remoteAddress) || user?.role === 'admin') return 'allowed';
  return user ? 403 : 401;
}

export const allowMetricsReaders: RequestHandler = (req, _res, next) => {
  const verdict = metricsAccess(req.socket.remoteAddress, req.user);
  if (verdict === 'allowed') return next();
  next(verdict === 401 ? AppError.unauthorized('Metrics are read from this machine or by an admin.') : AppError.forbidden());
};
