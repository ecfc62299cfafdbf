import { createHash, randomBytes } from 'node:crypto';

/** An invitation link's one-time token; only its SHA-256 is stored. */
export const newInviteToken = (): string => randomBytes(32).toString('base64url');

export const inviteTokenHash = (token: string): string => createHash('sha256').update(token).digest('hex');
