import type { WalkDetail, WalkFinish, WalkPhoto, WalkStepAnswer } from '@/shared/schemas/walks';

/** A picked photo: a web File/Blob, or a native file URI. */
export type PhotoFile = { blob: Blob; name: string } | { uri: string; name: string; type: string };

/**
 * Everything the walk screen needs, supplied from outside so the same
 * screen serves staff walks (hooks/use-walks.ts) and, later, guest walks by
 * link with their own API calls.
 */
export interface WalkSource {
  data: WalkDetail | undefined;
  isLoading: boolean;
  error: Error | null;
  refetch: () => void;
  sendStep: (input: { stepId: string; event: unknown; note: string | null }) => Promise<WalkStepAnswer>;
  undo: (stepId: string) => Promise<WalkStepAnswer>;
  finish: (input: WalkFinish) => Promise<unknown>;
  uploadPhoto: (file: PhotoFile, step: string, onProgress: (fraction: number) => void) => Promise<WalkPhoto>;
  removePhoto: (photoId: string) => Promise<unknown>;
  /** Where the printable report and the PDF are, and where "back to the job" goes; null when not offered. */
  links: { report: string | null; pdf: string | null; job: string | null };
  /** Words under a finished walk's outcome; the staff wording when absent (guests have no job to start another walk from). */
  finishedNote?: string;
}

/** A fresh step id (UUID v4); kept for retries so a step is never recorded twice. */
export function newStepId(): string {
  const c = globalThis.crypto;
  if (c?.randomUUID) return c.randomUUID();
  // Pages served over plain http on a LAN have no randomUUID; getRandomValues still works.
  const b = c.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, '0')).join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}
