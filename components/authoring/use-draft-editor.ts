import { useCallback, useEffect, useRef, useState } from 'react';
import type { Draft } from '@/shared/schemas/tree-authoring';
import { ApiError, api } from '@/hooks/api-client';
import { useSaveDraft } from '@/hooks/use-tree-drafts';
import type { Doc } from './editor-model';

/** Where the draft stands against the server. */
export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'failed' | 'conflict';

/** Quiet time after the last change before the draft saves itself. */
export const AUTOSAVE_MS = 1200;

/**
 * The editor's copy of a draft: changes apply at once on screen and are
 * saved on their own shortly after, each save naming the revision it is
 * based on. A refused save (someone else saved first) stops autosave and
 * keeps the author's copy until they decide; nothing is overwritten silently.
 */
export function useDraftEditor(treeId: number, draft: Draft) {
  const [doc, setDoc] = useState<Doc>(draft.doc as unknown as Doc);
  const [status, setStatus] = useState<SaveStatus>('saved');
  const [message, setMessage] = useState<string>();
  const [savedAt, setSavedAt] = useState(draft.updatedAt);
  const docRef = useRef(doc);
  const revision = useRef(draft.revision);
  const pending = useRef<Doc | null>(null);
  const inFlight = useRef(false);
  const stopped = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const save = useSaveDraft(treeId);

  const flush = useCallback(async () => {
    clearTimeout(timer.current);
    if (inFlight.current || stopped.current || !pending.current) return;
    const body = pending.current;
    pending.current = null;
    inFlight.current = true;
    setStatus('saving');
    try {
      const answer = await save.mutateAsync({ revision: revision.current, doc: body as unknown as Record<string, unknown> });
      revision.current = answer.revision;
      setSavedAt(answer.updatedAt);
      setMessage(undefined);
      inFlight.current = false;
      if (pending.current) void flush();
      else setStatus('saved');
    } catch (err) {
      inFlight.current = false;
      // Keep the unsaved copy: a newer change may already be waiting, else this one.
      pending.current = pending.current ?? body;
      if (err instanceof ApiError && err.status === 409) {
        stopped.current = true;
        setStatus('conflict');
      } else {
        setStatus('failed');
      }
      setMessage(err instanceof Error ? err.message : 'The draft could not be saved.');
    }
  }, [save]);

  /** Applies a change to the draft and schedules a save. */
  const update = useCallback(
    (fn: (d: Doc) => Doc) => {
      const next = fn(docRef.current);
      if (next === docRef.current) return;
      docRef.current = next;
      pending.current = next;
      setDoc(next);
      if (stopped.current) return;
      setStatus((s) => (s === 'saving' ? s : 'unsaved'));
      clearTimeout(timer.current);
      timer.current = setTimeout(() => void flush(), AUTOSAVE_MS);
    },
    [flush],
  );

  // Leaving the editor (in-app navigation, back button): send what is not saved yet, even as the page goes.
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      if (pending.current && !stopped.current) {
        void api(`/trees/${treeId}/draft`, { method: 'PUT', json: { revision: revision.current, doc: pending.current }, keepalive: true }).catch(() => undefined);
      }
    },
    [treeId],
  );

  return {
    doc,
    update,
    status,
    message,
    savedAt,
    /** Saves now (the "Save now" button, and before publishing). */
    saveNow: flush,
    /** The revision the next write must name. */
    revision: () => revision.current,
    /** True while something on screen is not yet saved on the server. */
    dirty: status !== 'saved',
  };
}
