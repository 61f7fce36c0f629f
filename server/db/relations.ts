import type { RelationOptions } from 'typeorm';

/**
 * Every reference between our tables is a foreign key that refuses to delete a row still pointed at:
 * records are voided or retired, never deleted from under their history (migration ForeignKeys).
 */
export const restrict: RelationOptions = { onDelete: 'RESTRICT', createForeignKeyConstraints: true };
