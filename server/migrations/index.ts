import { Foundation1764600000000 } from './1764600000000-Foundation';

// Listed explicitly: globs find nothing under tsx and vitest.
export const MIGRATIONS = [Foundation1764600000000];
