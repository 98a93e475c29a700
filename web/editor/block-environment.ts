import { createContext, useContext } from 'react';
import type { ApiIssue } from '#shared/api-error';
import type { Assumption } from '#shared/schemas/assumptions';
import type { StudyBlockResult } from '#shared/schemas/model-block';

/**
 * What a model block needs from the screen around it: the server's results, which config each
 * result was computed from (to tell a confirmed result from a preview), the engagement's
 * assumptions, and the save's refusals per block. Passed by context because TipTap renders node
 * views outside the screen's props.
 */
export interface BlockEnvironment {
  results: Record<string, StudyBlockResult>;
  /** JSON of the config the server last computed, per block id. */
  confirmedConfigs: Record<string, string>;
  assumptions: readonly Assumption[];
  assumptionsStatus: 'pending' | 'error' | 'success';
  /** Issues of the last refused save, per block id, with paths relative to the config ("spec.servers"). */
  saveIssues: Record<string, ApiIssue[]>;
  editable: boolean;
}

export const emptyEnvironment: BlockEnvironment = {
  results: {},
  confirmedConfigs: {},
  assumptions: [],
  assumptionsStatus: 'pending',
  saveIssues: {},
  editable: false,
};

export const BlockEnvironmentContext = createContext<BlockEnvironment>(emptyEnvironment);

export function useBlockEnvironment(): BlockEnvironment {
  return useContext(BlockEnvironmentContext);
}
