import { lazy, type ComponentType } from 'react';

/**
 * React.lazy for a module's named screen export, so each screen is its own chunk and the
 * first screen stays small.
 */
export function lazyScreen<M extends Record<string, unknown>, K extends keyof M & string>(load: () => Promise<M>, name: K) {
  return lazy(async () => ({ default: (await load())[name] as ComponentType }));
}
