import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { commentListBody, comparisonBody, revisionBody, revisionListBody } from './revision-bodies';
import { revisionKeys } from './revision-keys';

/** Every revision of one study, newest first as the API lists them. */
export const studyRevisionsQuery = (studyId: number) =>
  queryOptions({
    queryKey: revisionKeys.forStudy(studyId),
    queryFn: async ({ signal }) => (await api(`/api/studies/${studyId}/revisions`, { schema: revisionListBody, signal })).revisions,
  });

/** One frozen revision: snapshot, integrity check and what the signed-in user may do with it. */
export const revisionQuery = (id: number) =>
  queryOptions({
    queryKey: revisionKeys.detail(id),
    queryFn: async ({ signal }) => (await api(`/api/revisions/${id}`, { schema: revisionBody, signal })).revision,
    // A release under way (perhaps in another tab, or interrupted and about to be recorded as
    // failed by the server) is followed until it settles, so the panel shows the outcome.
    refetchInterval: (query) => (query.state.data?.release?.status === 'releasing' ? 3_000 : false),
  });

export const revisionCommentsQuery = (id: number) =>
  queryOptions({
    queryKey: revisionKeys.comments(id),
    queryFn: async ({ signal }) => (await api(`/api/revisions/${id}/comments`, { schema: commentListBody, signal })).comments,
  });

/** Text changes per section and every number that moved between two revisions of a study. */
export const comparisonQuery = (from: number, to: number) =>
  queryOptions({
    queryKey: revisionKeys.compare(from, to),
    queryFn: async ({ signal }) => (await api(`/api/revisions/${from}/compare/${to}`, { schema: comparisonBody, signal })).comparison,
    // Frozen revisions never change: the comparison of two of them is final.
    staleTime: Infinity,
  });

/** What waits for the signed-in partner's decision or release. */
export const reviewQueueQuery = () =>
  queryOptions({
    queryKey: revisionKeys.queue(),
    queryFn: async ({ signal }) => (await api('/api/review-queue', { schema: revisionListBody, signal })).revisions,
  });
