/**
 * Ids of blocks the author has just inserted: their view opens its settings at once. A module
 * set rather than a node attribute, so nothing about it is ever saved.
 */
export const freshBlocks = new Set<string>();
