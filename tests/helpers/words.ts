import { randomBytes } from 'node:crypto';

/** Letters only, so a search takes it for words (the index), not a number (PostgreSQL's exact lookup). */
export const inventedWord = (): string => `quenchwick${[...randomBytes(6)].map((b) => String.fromCharCode(97 + (b % 26))).join('')}`;
