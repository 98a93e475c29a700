import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { ApiIssue } from '#shared/api-error';
import type { StudyDetail } from '#shared/schemas/studies';
import { isApiError } from '../../../lib/api-error';
import { blockConfigs, issuesByBlock } from './document-blocks';
import { saveStudyDocument } from './study-mutations';
import { studyKeys } from './study-keys';

/** Where the text stands relative to the server. */
export type SaveStatus = 'saved' | 'pending' | 'saving' | 'offline' | 'conflict' | 'refused' | 'frozen';

/** Pause after the last keystroke before saving. */
export const AUTOSAVE_DELAY_MS = 1500;
/** While offline, how often to try again even without an "online" event (the server may be the one away). */
const OFFLINE_RETRY_MS = 15_000;

type Doc = StudyDetail['document'];

/**
 * Autosave for one study: saves ~1.5 s after typing stops, at once when the text loses focus or
 * the tab is hidden, one request at a time, always with the version the text was based on.
 * Offline it waits and retries when the browser is back online; a 409 stops saving until the
 * author chooses (reload or keep a copy); a refusal puts its issues on the blocks they name.
 */
export function useAutosave(study: StudyDetail) {
  const qc = useQueryClient();
  const doc = useRef<Doc>(study.document);
  const title = useRef(study.title);
  const baseVersion = useRef(study.version);
  const dirty = useRef(false);
  const inFlight = useRef(false);
  const timer = useRef<number | undefined>(undefined);
  const [status, setStatus] = useState<SaveStatus>('saved');
  const statusRef = useRef<SaveStatus>('saved');
  const [message, setMessage] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<Date | null>(null);
  const [results, setResults] = useState(study.blocks);
  const [confirmedConfigs, setConfirmedConfigs] = useState(() => blockConfigs(study.document));
  const [saveIssues, setSaveIssues] = useState<Record<string, ApiIssue[]>>({});

  // The save schedules its own follow-up; it reaches itself through this ref.
  const saveRef = useRef<() => Promise<void>>(async () => {});
  const set = useCallback((s: SaveStatus) => {
    statusRef.current = s;
    setStatus(s);
  }, []);

  const save = useCallback(async (): Promise<void> => {
    window.clearTimeout(timer.current);
    if (inFlight.current || !dirty.current || statusRef.current === 'conflict' || statusRef.current === 'frozen') return;
    if (!navigator.onLine) return set('offline');
    inFlight.current = true;
    dirty.current = false;
    const sent = doc.current;
    set('saving');
    try {
      const next = await saveStudyDocument(study.id, { document: sent, baseVersion: baseVersion.current, title: title.current.trim() || undefined });
      baseVersion.current = next.version;
      setResults(next.blocks);
      setConfirmedConfigs(blockConfigs(sent));
      setSaveIssues({});
      setMessage(null);
      setSavedAt(new Date());
      qc.setQueryData(studyKeys.detail(study.id), { ...next, document: sent });
      set(dirty.current ? 'pending' : 'saved');
      if (dirty.current) timer.current = window.setTimeout(() => void saveRef.current(), AUTOSAVE_DELAY_MS);
    } catch (err) {
      dirty.current = true;
      if (!isApiError(err) || err.status === 0) {
        set('offline');
      } else if (err.status === 409) {
        setMessage(err.message);
        set(err.issues.some((i) => i.path === 'status') ? 'frozen' : 'conflict');
      } else {
        const { byBlock, general } = issuesByBlock(sent, err.issues);
        setSaveIssues(byBlock);
        setMessage(general[0] ? `${general[0].path}: ${general[0].message}` : Object.keys(byBlock).length ? 'Some inputs need fixing; they are marked in their blocks.' : err.message);
        set('refused');
      }
    } finally {
      inFlight.current = false;
    }
  }, [qc, set, study.id]);
  useEffect(() => {
    saveRef.current = save;
  }, [save]);

  const schedule = useCallback(() => {
    dirty.current = true;
    if (['conflict', 'frozen'].includes(statusRef.current)) return;
    if (statusRef.current !== 'saving' && statusRef.current !== 'offline') set('pending');
    window.clearTimeout(timer.current);
    timer.current = window.setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
  }, [save, set]);

  const changeDocument = useCallback((next: Doc) => {
    doc.current = next;
    schedule();
  }, [schedule]);

  const changeTitle = useCallback((next: string) => {
    title.current = next;
    schedule();
  }, [schedule]);

  useEffect(() => {
    const online = () => void save();
    const hidden = () => document.visibilityState === 'hidden' && void save();
    const leaving = (e: BeforeUnloadEvent) => {
      if (!dirty.current && !inFlight.current) return;
      void save();
      e.preventDefault(); // asks the browser to confirm leaving with unsaved text
    };
    const retry = window.setInterval(() => statusRef.current === 'offline' && void save(), OFFLINE_RETRY_MS);
    const offline = () => statusRef.current === 'pending' && set('offline');
    window.addEventListener('online', online);
    window.addEventListener('offline', offline);
    document.addEventListener('visibilitychange', hidden);
    window.addEventListener('beforeunload', leaving);
    return () => {
      window.clearInterval(retry);
      window.clearTimeout(timer.current);
      window.removeEventListener('online', online);
      window.removeEventListener('offline', offline);
      document.removeEventListener('visibilitychange', hidden);
      window.removeEventListener('beforeunload', leaving);
    };
  }, [save, set]);

  return {
    status,
    message,
    savedAt,
    results,
    confirmedConfigs,
    saveIssues,
    changeDocument,
    changeTitle,
    saveNow: save,
    /** The text as typed, for keeping it as a copy. */
    currentDocument: () => doc.current,
    currentTitle: () => title.current,
  };
}
