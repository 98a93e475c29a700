/** "1 paragraph", "3 paragraphs": a count with its noun, `many` for nouns not ending in plain -s. */
export const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;
