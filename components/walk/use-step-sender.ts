import { useState } from 'react';
import { canRetry } from '@/hooks/api-client';
import { newStepId, type WalkSource } from './walk-source';

type Pending = { kind: 'step'; stepId: string; event: unknown; note: string | null; words: string } | { kind: 'undo'; stepId: string; words: string };

/**
 * Sends answers and undos with a step id made once per answer. When the
 * network fails the same id is sent again on Retry, so the server records the
 * answer once however many times it arrives. A refusal (409) is shown and dropped.
 */
export function useStepSender(source: WalkSource) {
  const [pending, setPending] = useState<Pending | null>(null);
  const [error, setError] = useState<{ message: string; retryable: boolean } | null>(null);

  const run = async (p: Pending): Promise<boolean> => {
    setPending(p);
    setError(null);
    try {
      if (p.kind === 'step') await source.sendStep({ stepId: p.stepId, event: p.event, note: p.note });
      else await source.undo(p.stepId);
      setPending(null);
      return true;
    } catch (err) {
      const retryable = canRetry(err);
      setError({ message: err instanceof Error ? err.message : 'That did not work.', retryable });
      if (!retryable) setPending(null);
      else setPending(p);
      return false;
    }
  };

  return {
    busy: pending !== null && error === null,
    /** The answer waiting for a retry, if the last send failed on the way. */
    unsent: error?.retryable ? pending : null,
    error,
    answer: (event: unknown, note: string | null, words: string) => run({ kind: 'step', stepId: newStepId(), event, note, words }),
    undo: () => run({ kind: 'undo', stepId: newStepId(), words: 'Going back one step' }),
    retry: () => (pending ? run(pending) : Promise.resolve(false)),
    dismiss: () => {
      setPending(null);
      setError(null);
    },
  };
}
