/**
 * The walk report as data: what the printable page and the PDF both show.
 * Pure, so the screen and the server tell the same story from one walk.
 */
import type { TreeDoc } from '@/trees/tree-format';
import { HAZARD_LABELS, INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { VERDICT_LABELS, VERDICT_TONES, type VerdictTone } from '@/shared/readings/verdict-labels';
import type { Verdict } from '@/shared/readings/reading-kinds';
import type { WalkDetail, WalkPhoto, WalkStepRecord } from './schemas/walks';
import { WALK_OUTCOME_LABELS } from './schemas/walks';


export interface ReportCaution {
  title: string;
  text: string;
}

export interface ReportStep {
  seq: number;
  stepId: string;
  title: string;
  /** What was answered, in words: the button label, "Done", or the reading with its unit. */
  answer: string;
  verdict: { word: string; tone: VerdictTone } | null;
  summary: string | null;
  note: string | null;
  by: string | null;
  at: string;
  photos: WalkPhoto[];
}

export interface WalkReport {
  title: string;
  shopName: string;
  job: { roNumber: string; customerName: string; vehicle: string; vin: string | null; mileage: number | null; install: string[] } | null;
  treeTitle: string;
  treeVersion: number;
  steps: ReportStep[];
  /** The step the walk stands at: a cause, a hand-over, or where it stopped. */
  end: { title: string; kind: string; cause?: { area: string; fix: string }; refer?: { to: string; reason: string }; photos: WalkPhoto[] };
  outcome: string | null;
  causeText: string | null;
  finishNote: string | null;
  technician: string | null;
  startedAt: string;
  finishedAt: string | null;
  timeSpent: string | null;
  cautions: ReportCaution[];
  undoneCount: number;
  context: string;
}

/** "1 h 05 min", "12 min", "under a minute". */
export function formatDuration(seconds: number | null): string | null {
  if (seconds === null) return null;
  if (seconds < 60) return 'under a minute';
  const m = Math.round(seconds / 60);
  return m >= 60 ? `${Math.floor(m / 60)} h ${String(m % 60).padStart(2, '0')} min` : `${m} min`;
}

/** The words for one recorded answer at a step of this tree. */
export function answerWords(doc: TreeDoc, record: Pick<WalkStepRecord, 'event' | 'fromStep' | 'readingValue' | 'readingUnit'>): string {
  const event = record.event as { type?: string; needle?: string; profile?: string } | null;
  if (!event?.type) return '';
  if (event.type === 'done') return 'Done';
  if (event.type === 'reading') {
    const extra = [event.needle ? `needle ${event.needle.replace(/_/g, ' ')}` : '', event.profile ? `${event.profile.replace(/_/g, ' ')} engine` : ''].filter(Boolean).join(', ');
    return `${record.readingValue} ${record.readingUnit ?? ''}`.trim() + (extra ? ` (${extra})` : '');
  }
  const def = doc.machine.states[record.fromStep]?.on?.[event.type];
  const first = Array.isArray(def) ? def[0] : def;
  return first?.description ?? event.type.replace(/^answer\./, '').replace(/-/g, ' ');
}

/** Builds the report from a walk as GET /api/walks/:id returns it. */
export function buildWalkReport(d: WalkDetail): WalkReport {
  const { doc, walk } = d;
  const live = d.history.filter((h) => h.kind === 'event' && !h.undone);
  const lastVisit = new Map<string, number>();
  live.forEach((h) => lastVisit.set(h.fromStep, h.seq));
  const photosFor = (stepId: string) => d.photos.filter((p) => p.step === stepId);

  const steps: ReportStep[] = live.map((h) => {
    const verdict = h.verdict ? (h.verdict as Verdict) : null;
    return {
      seq: h.seq,
      stepId: h.fromStep,
      title: doc.machine.states[h.fromStep]?.meta.title ?? h.fromStep,
      answer: answerWords(doc, h),
      verdict: verdict ? { word: VERDICT_LABELS[verdict] ?? verdict, tone: VERDICT_TONES[verdict] ?? 'caution' } : null,
      summary: h.judgement?.summary ?? null,
      note: h.note,
      by: h.by?.name ?? null,
      at: h.createdAt,
      // Photos of a step visited twice go with its last visit.
      photos: lastVisit.get(h.fromStep) === h.seq && h.fromStep !== d.position.stepId ? photosFor(h.fromStep) : [],
    };
  });

  const endMeta = doc.machine.states[d.position.stepId].meta;
  const seen = new Set<string>();
  const cautions: ReportCaution[] = [];
  for (const stepId of d.position.path) {
    for (const c of doc.machine.states[stepId]?.meta.cautions ?? []) {
      const key = `${c.hazard}|${c.text}`;
      if (seen.has(key)) continue;
      seen.add(key);
      cautions.push({ title: HAZARD_LABELS[c.hazard], text: c.text });
    }
  }

  const job = d.job;
  return {
    title: job ? `Walk report: RO ${job.roNumber}` : `Walk report #${walk.id}`,
    shopName: d.shop.name,
    job: job
      ? {
          roNumber: job.roNumber,
          customerName: job.customerName,
          vehicle: [job.year, job.make, job.model, job.engine].filter(Boolean).join(' ') || 'Vehicle not recorded',
          vin: job.vin,
          mileage: job.mileage,
          install: job.install.map((c) => (c.text ? `${INSTALL_TYPE_LABELS[c.type]}: ${c.text}` : INSTALL_TYPE_LABELS[c.type])),
        }
      : null,
    treeTitle: doc.title,
    treeVersion: walk.tree.version,
    steps,
    end: {
      title: endMeta.title,
      kind: endMeta.kind,
      ...(endMeta.kind === 'cause' ? { cause: { area: endMeta.cause.area, fix: endMeta.cause.fix } } : {}),
      ...(endMeta.kind === 'refer' ? { refer: { to: endMeta.refer.to, reason: endMeta.refer.reason } } : {}),
      photos: photosFor(d.position.stepId),
    },
    outcome: walk.outcome ? WALK_OUTCOME_LABELS[walk.outcome] : null,
    causeText: walk.causeText,
    finishNote: walk.finishNote,
    technician: walk.startedBy?.name ?? null,
    startedAt: walk.startedAt,
    finishedAt: walk.finishedAt,
    timeSpent: formatDuration(walk.timeSpentS),
    cautions,
    undoneCount: d.history.filter((h) => h.kind === 'undo').length,
    context: `Readings judged at ${walk.context.altitudeM} m altitude${walk.context.baroKpa ? ` and ${walk.context.baroKpa} kPa barometer` : ''}.`,
  };
}
