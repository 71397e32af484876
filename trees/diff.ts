/**
 * The difference between two versions of a tree, step by step: which steps
 * were added, removed or changed, and for each changed field a before/after
 * with a line-by-line difference (longest common subsequence). Pure; works on
 * drafts that do not pass the format yet, so every read is defensive.
 */
import { HAZARD_LABELS, INSTALL_TYPE_LABELS, STEP_KIND_LABELS, SYMPTOM_LABELS, type StateDef, type TreeDoc } from './tree-format';
import { transitionsOf } from './graph';

export interface LineChange {
  op: 'same' | 'added' | 'removed';
  text: string;
}

export interface FieldChange {
  field: string;
  /** Words for the field, for screens. */
  label: string;
  before: string;
  after: string;
  /** Line-by-line difference of before and after. */
  lines: LineChange[];
}

export interface StepDiff {
  stepId: string;
  change: 'added' | 'removed' | 'changed';
  kind: string;
  title: string;
  fields: FieldChange[];
}

export interface TreeDiff {
  /** Changes to the tree's own facts (title, symptom, first step…). */
  tree: FieldChange[];
  steps: StepDiff[];
  /** Steps present in both versions with nothing changed. */
  unchanged: number;
}

// Beyond this many lines on both sides the quadratic table gets costly; show a plain replace instead.
const MAX_LCS_CELLS = 4_000_000;

/** Line-by-line difference of two texts by longest common subsequence; removed lines come before added ones. */
export function lineDiff(before: string, after: string): LineChange[] {
  const a = before === '' ? [] : before.split('\n');
  const b = after === '' ? [] : after.split('\n');
  // Trim the common head and tail first: most edits touch a few lines.
  let head = 0;
  while (head < a.length && head < b.length && a[head] === b[head]) head++;
  let tail = 0;
  while (tail < a.length - head && tail < b.length - head && a[a.length - 1 - tail] === b[b.length - 1 - tail]) tail++;
  const midA = a.slice(head, a.length - tail);
  const midB = b.slice(head, b.length - tail);
  const out: LineChange[] = a.slice(0, head).map((text) => ({ op: 'same', text }));
  if ((midA.length + 1) * (midB.length + 1) > MAX_LCS_CELLS) {
    out.push(...midA.map((text) => ({ op: 'removed' as const, text })), ...midB.map((text) => ({ op: 'added' as const, text })));
  } else {
    out.push(...lcsDiff(midA, midB));
  }
  out.push(...a.slice(a.length - tail).map((text) => ({ op: 'same' as const, text })));
  return out;
}

function lcsDiff(a: string[], b: string[]): LineChange[] {
  const n = a.length;
  const m = b.length;
  // len[i][j] = LCS length of a[i..] and b[j..], in one flat array.
  const len = new Uint32Array((n + 1) * (m + 1));
  const at = (i: number, j: number) => i * (m + 1) + j;
  for (let i = n - 1; i >= 0; i--) {
    for (let j = m - 1; j >= 0; j--) {
      len[at(i, j)] = a[i] === b[j] ? len[at(i + 1, j + 1)] + 1 : Math.max(len[at(i + 1, j)], len[at(i, j + 1)]);
    }
  }
  const out: LineChange[] = [];
  let i = 0;
  let j = 0;
  while (i < n && j < m) {
    if (a[i] === b[j]) {
      out.push({ op: 'same', text: a[i] });
      i++;
      j++;
    } else if (len[at(i + 1, j)] >= len[at(i, j + 1)]) {
      out.push({ op: 'removed', text: a[i++] });
    } else {
      out.push({ op: 'added', text: b[j++] });
    }
  }
  while (i < n) out.push({ op: 'removed', text: a[i++] });
  while (j < m) out.push({ op: 'added', text: b[j++] });
  return out;
}

const str = (v: unknown) => (typeof v === 'string' ? v : v === undefined || v === null ? '' : String(v));
const list = (v: unknown): unknown[] => (Array.isArray(v) ? v : []);

/** The comparable fields of one step, each as text (multi-valued fields one entry per line). */
export function stepFields(state: StateDef | undefined): Array<{ field: string; label: string; text: string }> {
  const meta = (state?.meta ?? {}) as Record<string, unknown>;
  const kind = str(meta.kind);
  const fields = [
    { field: 'kind', label: 'Kind', text: STEP_KIND_LABELS[kind as keyof typeof STEP_KIND_LABELS] ?? kind },
    { field: 'title', label: 'Title', text: str(meta.title) },
    { field: 'body', label: 'Text', text: str(meta.body) },
    {
      field: 'cautions',
      label: 'Cautions',
      text: list(meta.cautions)
        .map((c) => {
          const { hazard, text } = (c ?? {}) as { hazard?: string; text?: string };
          return `${HAZARD_LABELS[hazard as keyof typeof HAZARD_LABELS] ?? str(hazard)}: ${str(text)}`;
        })
        .join('\n'),
    },
    { field: 'photoPrompts', label: 'Photo prompts', text: list(meta.photoPrompts).map(str).join('\n') },
    { field: 'answers', label: kind === 'reading' ? 'Verdict branches' : 'Answers', text: answerLines(state).join('\n') },
  ];
  const reading = meta.reading as Record<string, unknown> | undefined;
  if (reading) fields.push({ field: 'reading', label: 'Reading', text: readingWords(reading) });
  const cause = meta.cause as Record<string, unknown> | undefined;
  if (cause) {
    fields.push(
      { field: 'cause.code', label: 'Cause code', text: str(cause.code) },
      { field: 'cause.area', label: 'Part or area', text: str(cause.area) },
      { field: 'cause.fix', label: 'Fix', text: str(cause.fix) },
    );
  }
  const refer = meta.refer as Record<string, unknown> | undefined;
  if (refer) {
    fields.push({ field: 'refer.to', label: 'Hand over to', text: str(refer.to) }, { field: 'refer.reason', label: 'Reason', text: str(refer.reason) });
  }
  return fields;
}

function answerLines(state: StateDef | undefined): string[] {
  if (!state || typeof state.on !== 'object' || state.on === null) return [];
  return transitionsOf(state).map(({ event, t }) => {
    const verdict = t?.guard?.params?.is;
    const name = verdict ? `when ${verdict}` : event === 'done' ? 'Done' : str(t?.description) || event;
    return `${name} → ${str(t?.target)}`;
  });
}

function readingWords(r: Record<string, unknown>): string {
  if (r.kind === 'range') return `range: ${str(r.quantity)}, ${str(r.min)} to ${str(r.max)} ${str(r.unit)}`;
  if (r.kind === 'fuel_trim') return `fuel_trim at ${str(r.rpm) || 'idle'} rpm`;
  if (r.kind === 'idle_vacuum') return `idle_vacuum${r.profile ? `, ${str(r.profile)} engine` : ''}`;
  return str(r.kind);
}

function change(field: string, label: string, before: string, after: string): FieldChange | undefined {
  return before === after ? undefined : { field, label, before, after, lines: lineDiff(before, after) };
}

function treeFields(doc: TreeDoc | undefined) {
  const d = (doc ?? {}) as Partial<TreeDoc>;
  return [
    { field: 'title', label: 'Tree title', text: str(d.title) },
    { field: 'symptom', label: 'Symptom', text: SYMPTOM_LABELS[d.symptom as keyof typeof SYMPTOM_LABELS] ?? str(d.symptom) },
    { field: 'installTypes', label: 'Install types', text: list(d.installTypes).map((t) => INSTALL_TYPE_LABELS[t as keyof typeof INSTALL_TYPE_LABELS] ?? str(t)).join('\n') },
    { field: 'summary', label: 'Summary', text: str(d.summary) },
    { field: 'initial', label: 'First step', text: str(d.machine?.initial) },
  ];
}

const statesOf = (doc: TreeDoc | undefined): Record<string, StateDef> => {
  const states = (doc as { machine?: { states?: unknown } } | undefined)?.machine?.states;
  return states && typeof states === 'object' ? (states as Record<string, StateDef>) : {};
};

/** Step-by-step difference from `before` to `after` (steps in `after`'s order, removed ones last). */
export function diffTrees(before: TreeDoc | undefined, after: TreeDoc | undefined): TreeDiff {
  const tb = treeFields(before);
  const ta = treeFields(after);
  const tree = ta.map((f, i) => change(f.field, f.label, tb[i].text, f.text)).filter((c): c is FieldChange => !!c);

  const sb = statesOf(before);
  const sa = statesOf(after);
  const steps: StepDiff[] = [];
  let unchanged = 0;
  const describe = (s: StateDef | undefined) => ({ kind: str(s?.meta?.kind), title: str(s?.meta?.title) });

  for (const [id, state] of Object.entries(sa)) {
    const old = sb[id];
    const now = stepFields(state);
    if (!old) {
      const fields = now.filter((f) => f.text !== '').map((f) => change(f.field, f.label, '', f.text)!);
      steps.push({ stepId: id, change: 'added', ...describe(state), fields });
      continue;
    }
    const was = new Map(stepFields(old).map((f) => [f.field, f]));
    const fields: FieldChange[] = [];
    for (const f of now) {
      const c = change(f.field, f.label, was.get(f.field)?.text ?? '', f.text);
      if (c) fields.push(c);
      was.delete(f.field);
    }
    // Fields only the old step had (a cause step that became an ask step loses its cause fields).
    for (const f of was.values()) if (f.text !== '') fields.push(change(f.field, f.label, f.text, '')!);
    if (fields.length) steps.push({ stepId: id, change: 'changed', ...describe(state), fields });
    else unchanged++;
  }
  for (const [id, state] of Object.entries(sb)) {
    if (sa[id]) continue;
    const fields = stepFields(state).filter((f) => f.text !== '').map((f) => change(f.field, f.label, f.text, '')!);
    steps.push({ stepId: id, change: 'removed', ...describe(state), fields });
  }
  return { tree, steps, unchanged };
}
