// Saves the editor's working copy a moment after the lead stops typing, with the revision it was
// based on. One save is in flight at a time; edits made meanwhile are saved right after it.
// A stale revision (someone else saved) stops saving and reports a conflict: the editor then
// offers to reload theirs or compare, and never overwrites their work without being told to.
import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiError } from '../../../lib/api-client';
import { useSaveDraft } from '../api/save-draft';
import type { EditableTree } from '../draft-model';

export type SaveState =
  | { kind: 'saved' }
  | { kind: 'waiting' }
  | { kind: 'saving' }
  | { kind: 'failed'; message: string }
  | { kind: 'conflict'; message: string };

interface AutosaveOptions {
  treeId: string;
  tree: EditableTree;
  /** The revision the working copy started from. */
  revision: number;
  delayMs?: number;
}

export interface DraftAutosave {
  state: SaveState;
  /** The revision the next save will send. */
  revision: () => number;
  /** Saves at once (e.g. before leaving for "Check and publish"); true when all is saved. */
  saveNow: () => Promise<boolean>;
  /** After a conflict: take the server's copy as the new base (the editor shows it). */
  adopt: (tree: EditableTree, revision: number) => void;
  /** After comparing: save the working copy over theirs, on purpose. */
  overwrite: (theirRevision: number) => Promise<boolean>;
}

export function useDraftAutosave({
  treeId,
  tree,
  revision,
  delayMs = 800,
}: AutosaveOptions): DraftAutosave {
  const { mutateAsync } = useSaveDraft();
  const [state, setState] = useState<SaveState>({ kind: 'saved' });
  const revisionRef = useRef(revision);
  // null: nothing is known to be saved, so the next save goes out whatever it holds.
  const savedRef = useRef<EditableTree | null>(tree);
  const latestRef = useRef<EditableTree>(tree);
  const queue = useRef<Promise<boolean>>(Promise.resolve(true));
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const blocked = useRef(false);

  const clearTimer = () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
  };

  // Saves run one after another (a queue), so two can never go out with the same revision.
  const send = useCallback((): Promise<boolean> => {
    const run = async (): Promise<boolean> => {
      while (!blocked.current && latestRef.current !== savedRef.current) {
        const sent = latestRef.current;
        setState({ kind: 'saving' });
        try {
          const saved = await mutateAsync({
            treeId,
            revision: revisionRef.current,
            definition: sent,
          });
          revisionRef.current = saved.revision;
          savedRef.current = sent;
        } catch (error) {
          if (isApiError(error) && error.status === 409) {
            blocked.current = true;
            setState({ kind: 'conflict', message: error.message });
          } else {
            setState({
              kind: 'failed',
              message: error instanceof Error ? error.message : 'The draft was not saved.',
            });
          }
          return false;
        }
        // Edits typed while the save was on its way go round the loop straight after it.
      }
      if (blocked.current) return false;
      setState({ kind: 'saved' });
      return true;
    };
    const next = queue.current.then(run, run);
    queue.current = next;
    return next;
  }, [mutateAsync, treeId]);

  useEffect(() => {
    latestRef.current = tree;
    if (tree === savedRef.current || blocked.current) return;
    setState((before) => (before.kind === 'saving' ? before : { kind: 'waiting' }));
    clearTimer();
    timer.current = setTimeout(() => {
      timer.current = null;
      void send();
    }, delayMs);
  }, [tree, delayMs, send]);

  // Leaving the editor saves what is waiting instead of dropping it; closing the tab warns.
  useEffect(() => {
    const warn = (event: BeforeUnloadEvent) => {
      if (latestRef.current !== savedRef.current) event.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => {
      window.removeEventListener('beforeunload', warn);
      if (timer.current && !blocked.current) {
        clearTimer();
        void send();
      }
    };
  }, [send]);

  const saveNow = useCallback(async () => {
    if (blocked.current) return false;
    clearTimer();
    return send();
  }, [send]);

  const adopt = useCallback((next: EditableTree, nextRevision: number) => {
    clearTimer();
    blocked.current = false;
    revisionRef.current = nextRevision;
    savedRef.current = next;
    latestRef.current = next;
    setState({ kind: 'saved' });
  }, []);

  const overwrite = useCallback(
    async (theirRevision: number) => {
      blocked.current = false;
      revisionRef.current = theirRevision;
      savedRef.current = null;
      return send();
    },
    [send],
  );

  const currentRevision = useCallback(() => revisionRef.current, []);

  return { state, revision: currentRevision, saveNow, adopt, overwrite };
}
