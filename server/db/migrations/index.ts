import { Foundation1796165211497 } from './1796165211497-Foundation';

/** Listed explicitly: Vitest cannot load migrations from a glob. Append new ones in order. */
export const migrations = [Foundation1796165211497];
