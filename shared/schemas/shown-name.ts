import { z } from 'zod';

/**
 * Control characters (C0, DEL, C1) and the invisible marks that reorder or hide text: a name like
 * "Dana\u202Etnatlusnoc" reads backwards from the mark on, in every list and PDF that shows it.
 * Right-to-left names need none of them (the browser and the PDF order such scripts themselves).
 */
// eslint-disable-next-line no-control-regex -- removing control characters is the point
export const INVISIBLE_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2060\u2066-\u2069\ufeff]/g;

export const withoutInvisible = (text: string): string => text.replace(INVISIBLE_CHARACTERS, '');

/** A name or title other people read: invisible characters removed, trimmed, 1 to `max` characters. */
export const shownName = (whenEmpty: string, max: number) => z.string().transform(withoutInvisible).pipe(z.string().trim().min(1, whenEmpty).max(max));
