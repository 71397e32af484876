import type { Knex } from 'knex';
import { applyEvent, parseTree, replayWalk, shortestToCause, TreeEngineError, type WalkContext, type WalkEvent } from '@/trees/engine';
import type { TreeDoc } from '@/trees/tree-format';
import type { WalkDetail, WalkFinish, WalkPhoto, WalkPosition, WalkStepAnswer, WalkSummary } from '@/shared/schemas/walks';
import { createWalkRepository, insertStepQuery, walkUpdateQuery, type WalkPatch, type WalkRow, type WalkStepRow } from '../repositories/walk-repository';
import { createWalkAppendRepository, type WalkAppend } from '../repositories/walk-append-repository';
import { createWalkTreeRepository, pinnedVersionQuery, toPinned, type PinnedTree } from '../repositories/walk-tree-repository';
import { createJobRepository } from '../repositories/job-repository';
import { AppError, badRequest, conflict, notFound } from '../errors';
import type { PhotoService } from './photo-service';
import { toJob } from './job-service';
import { effectiveSteps, liveEvents, timeSpentSeconds, toStepRecord, toWalkPhoto, toWalkSummary } from './walk-records';

/** Who is acting: a signed-in person of a shop, or (id null) a customer walking by guest link. */
export interface Actor {
  id: number | null;
  shopId: number;
  /** Shown as who answered; signed-in people have it from their session. */
  name?: string | null;
}

/** A ceiling on a walk's step records (guest walks), checked inside the step's locked transaction. */
export interface RecordCap {
  max: number;
  refusal: () => Error;
}

const finishedRefusal = () => conflict('This walk is finished, so it can no longer change. Start a new walk to look again.');

// Published versions never change, so their parsed documents can be kept (bounded).
const docCache = new Map<number, TreeDoc>();
function parsedDoc(tree: PinnedTree): TreeDoc {
  const hit = docCache.get(tree.versionId);
  if (hit) return hit;
  const parsed = parseTree(tree.doc);
  if (!parsed.ok) throw new AppError(409, 'tree_invalid', `The tree "${tree.title}" (version ${tree.version}) no longer passes its checks, so it cannot be walked. Ask a lead to publish a fixed version.`);
  if (docCache.size > 200) docCache.delete(docCache.keys().next().value!);
  docCache.set(tree.versionId, parsed.doc);
  return parsed.doc;
}

const contextOf = (w: WalkRow): WalkContext => ({ altitudeM: w.altitude_m, ...(w.baro_kpa !== null ? { baroKpa: w.baro_kpa } : {}) });

/** Walks: start on a job, record answers that the pinned tree accepts, undo, photos, finish. */
export function createWalkService(knex: Knex, photos: PhotoService) {
  const walks = createWalkRepository(knex);
  const appends = createWalkAppendRepository(knex);
  const trees = createWalkTreeRepository(knex);
  const jobs = createJobRepository(knex);

  /**
   * The parsed document of a walk's version: from memory once parsed (a
   * version never changes), else through `load`. Inside a transaction, load
   * through it: a second pooled connection per request can starve the pool.
   */
  async function pinnedDoc(w: WalkRow, load: () => Promise<PinnedTree | undefined>): Promise<TreeDoc> {
    const cached = docCache.get(w.tree_version_id);
    if (cached) return cached;
    const tree = await load();
    if (!tree) throw notFound('The tree version of this walk');
    return parsedDoc(tree);
  }

  /** Loads a walk's version inside its append transaction. */
  const versionIn = (tx: WalkAppend, shopId: number) => async () => toPinned(await tx.first(pinnedVersionQuery(knex, shopId, tx.walk.tree_version_id)));

  /** A walk's version with its facts (title, number) and parsed document, for reading a walk. */
  async function pinned(shopId: number, w: WalkRow): Promise<{ tree: PinnedTree; doc: TreeDoc }> {
    // The document of a version never changes: once parsed, only the small facts are read again.
    const cached = docCache.get(w.tree_version_id);
    const tree = cached ? await trees.versionMeta(shopId, w.tree_version_id) : await trees.version(shopId, w.tree_version_id);
    if (!tree) throw notFound('The tree version of this walk');
    return { tree, doc: cached ?? parsedDoc(tree) };
  }

  function positionOf(doc: TreeDoc, steps: readonly WalkStepRow[], ctx: WalkContext): WalkPosition {
    const events = liveEvents(steps);
    const pos = fitted(() => replayWalk(doc, events, ctx));
    return { ...pos, stepsTaken: events.length, shortestToCause: shortestToCause(doc, pos.stepId) };
  }

  /** Runs a replay; stored answers that no longer fit the tree are a conflict, not a server error. */
  function fitted<T>(replay: () => T): T {
    try {
      return replay();
    } catch (err) {
      if (err instanceof TreeEngineError) throw conflict(`This walk's recorded answers no longer fit its tree: ${err.message}`);
      throw err;
    }
  }

  async function findOpenLocked(trx: Knex.Transaction, actor: Actor, walkId: number) {
    const w = await walks.lock(trx, actor.shopId, walkId);
    if (!w) throw notFound('That walk');
    return w;
  }

  const stepIdTaken = () => conflict('That step id was already used for something else. Reload the walk and try again.');

  /**
   * The record of a step id already in this walk (a retry), or undefined. An
   * id used in another walk is found by the insert itself (its primary key).
   */
  function earlier(steps: readonly WalkStepRow[], stepId: string, kind: 'event' | 'undo') {
    const row = steps.find((s) => s.id === stepId);
    if (row && row.kind !== kind) throw stepIdTaken();
    return row;
  }

  /** Writes a step and the walk's new position, and commits; a step id another walk already used is a conflict, not a server error. */
  async function commitStep(tx: WalkAppend, actor: Actor, row: Omit<WalkStepRow, 'user_name'>, patch: WalkPatch) {
    try {
      await tx.commit(insertStepQuery(knex, row), walkUpdateQuery(knex, actor.shopId, row.walk_id, patch));
    } catch (err) {
      if ((err as { errno?: number }).errno === 1062) throw stepIdTaken();
      throw err;
    }
  }

  /** Runs one answer's transaction on a walk; it always ends, committed by `commitStep` or rolled back. */
  async function onLockedWalk<T>(actor: Actor, walkId: number, work: (tx: WalkAppend) => Promise<T>): Promise<T> {
    const tx = await appends.open(actor.shopId, walkId);
    if (!tx) throw notFound('That walk');
    try {
      return await work(tx);
    } finally {
      await tx.end();
    }
  }

  /** The answer to a retry: the record as first stored, and where the walk stands now. */
  async function retried(tx: WalkAppend, actor: Actor, seen: WalkStepRow): Promise<WalkStepAnswer> {
    const position = positionOf(await pinnedDoc(tx.walk, versionIn(tx, actor.shopId)), tx.steps, contextOf(tx.walk));
    return { step: toStepRecord(seen, effectiveSteps(tx.steps).undone), position };
  }

  /** The answer to a step just recorded: built from what the transaction holds, with no read back. */
  function recorded(actor: Actor, row: Omit<WalkStepRow, 'user_name'>, position: WalkPosition): WalkStepAnswer {
    return { step: toStepRecord({ ...row, user_name: actor.name ?? null }, new Set()), position };
  }

  return {
    /** Starts a walk on a job, pinned to the tree's latest published version and the shop's altitude now. */
    async start(actor: Actor, input: { jobId: number; treeId: number }): Promise<WalkSummary> {
      const job = await jobs.findById(actor.shopId, input.jobId);
      if (!job) throw notFound('That job');
      const tree = await trees.latestPublished(actor.shopId, input.treeId);
      if (!tree) throw conflict('That tree has no published version yet, so it cannot be walked. Pick another tree or ask a lead to publish it.');
      const doc = parsedDoc(tree);
      const shop = await walks.shop(actor.shopId);
      const id = await walks.insert({
        shop_id: actor.shopId,
        job_id: job.id,
        tree_id: tree.treeId,
        tree_version_id: tree.versionId,
        altitude_m: shop?.altitude_m ?? 0,
        baro_kpa: null,
        started_by: actor.id,
        current_step: doc.machine.initial,
      });
      return toWalkSummary((await walks.find(actor.shopId, id))!, tree);
    },

    /** Everything the walk screen and the report need, replayed from the records. */
    async get(shopId: number, walkId: number): Promise<WalkDetail> {
      const w = await walks.find(shopId, walkId);
      if (!w) throw notFound('That walk');
      const { tree, doc } = await pinned(shopId, w);
      const [steps, photoRows, shop, job] = await Promise.all([
        walks.steps(w.id),
        walks.photos(w.id),
        walks.shop(shopId),
        w.job_id ? jobs.findById(shopId, w.job_id) : undefined,
      ]);
      const { undone } = effectiveSteps(steps);
      return {
        walk: toWalkSummary(w, tree),
        job: job ? toJob(job) : null,
        shop: { name: shop?.name ?? '', pressureUnit: shop?.pressure_unit ?? 'inHg' },
        doc,
        position: positionOf(doc, steps, contextOf(w)),
        history: steps.map((s) => toStepRecord(s, undone)),
        photos: photoRows.map(toWalkPhoto),
      };
    },

    async listForJob(shopId: number, jobId: number): Promise<WalkSummary[]> {
      if (!(await jobs.findById(shopId, jobId))) throw notFound('That job');
      const rows = await walks.listForJob(shopId, jobId);
      // One read for the versions of all the walks, not one per walk.
      const versions = await trees.versionsMeta(shopId, rows.map((w) => w.tree_version_id));
      return rows.map((w) => {
        const tree = versions.get(w.tree_version_id);
        if (!tree) throw notFound('The tree version of this walk');
        return toWalkSummary(w, tree);
      });
    },

    /**
     * Records one answer in one transaction: lock the walk, return the earlier
     * answer if this step id was already recorded, replay the pinned tree, and
     * append the step only if the tree accepts the event.
     */
    async step(actor: Actor, walkId: number, input: { stepId: string; event: WalkEvent; note: string | null }, cap?: RecordCap): Promise<WalkStepAnswer> {
      // Two round trips (walk-append-repository.ts); the answer is built from what is known, with no read back.
      return onLockedWalk(actor, walkId, async (tx) => {
        const { walk: w, steps } = tx;
        const seen = earlier(steps, input.stepId, 'event');
        if (seen) return retried(tx, actor, seen);
        if (w.status !== 'open') throw finishedRefusal();
        if (cap && steps.length >= cap.max) throw cap.refusal();
        const doc = await pinnedDoc(w, versionIn(tx, actor.shopId));
        const events = liveEvents(steps);
        // One replay: the engine returns the path, whose last two steps are where the answer was given and where it leads.
        const result = fitted(() => applyEvent(doc, events, input.event, contextOf(w)));
        if (!result.ok) throw new AppError(409, 'step_refused', result.reason);
        const fromStep = result.path[result.path.length - 2];
        const reading = input.event.type === 'reading' ? (input.event as Extract<WalkEvent, { type: 'reading' }>) : undefined;
        const row: Omit<WalkStepRow, 'user_name'> = {
          id: input.stepId,
          walk_id: w.id,
          shop_id: actor.shopId,
          seq: (steps.at(-1)?.seq ?? 0) + 1,
          kind: 'event',
          event: input.event,
          undoes_step_id: null,
          from_step: fromStep,
          to_step: result.stepId,
          verdict: result.verdict ?? null,
          reading_value: reading ? reading.value : null,
          reading_unit: reading ? (reading.unit ?? result.judgement?.expected?.unit ?? null) : null,
          judgement: result.judgement ?? null,
          note: input.note,
          user_id: actor.id,
          // Stamped here, to the millisecond the column keeps, so a retry reads back exactly this answer.
          created_at: new Date(),
        };
        await commitStep(tx, actor, row, { current_step: result.stepId, step_count: events.length + 1, last_step_at: row.created_at });
        return recorded(actor, row, {
          stepId: result.stepId,
          final: result.final,
          path: result.path,
          stepsTaken: events.length + 1,
          shortestToCause: shortestToCause(doc, result.stepId),
        });
      });
    },

    /** Takes back the latest answer still in force, as a record of its own. */
    async undo(actor: Actor, walkId: number, input: { stepId: string }, cap?: RecordCap): Promise<WalkStepAnswer> {
      return onLockedWalk(actor, walkId, async (tx) => {
        const { walk: w, steps } = tx;
        const seen = earlier(steps, input.stepId, 'undo');
        if (seen) return retried(tx, actor, seen);
        if (w.status !== 'open') throw finishedRefusal();
        if (cap && steps.length >= cap.max) throw cap.refusal();
        const doc = await pinnedDoc(w, versionIn(tx, actor.shopId));
        const { live } = effectiveSteps(steps);
        const last = live.at(-1);
        if (!last) throw conflict('There is nothing to undo: this walk is at its first step.');
        const from = positionOf(doc, steps, contextOf(w));
        const row: Omit<WalkStepRow, 'user_name'> = {
          id: input.stepId,
          walk_id: w.id,
          shop_id: actor.shopId,
          seq: steps.at(-1)!.seq + 1,
          kind: 'undo',
          event: null,
          undoes_step_id: last.id,
          from_step: from.stepId,
          to_step: last.from_step,
          verdict: null,
          reading_value: null,
          reading_unit: null,
          judgement: null,
          note: null,
          user_id: actor.id,
          created_at: new Date(),
        };
        await commitStep(tx, actor, row, { current_step: last.from_step, step_count: live.length - 1, last_step_at: row.created_at });
        return recorded(actor, row, positionOf(doc, [...steps, { ...row, user_name: null }], contextOf(w)));
      });
    },

    /** Closes a walk with its outcome; the cause comes from the cause step reached, or from the words given. */
    async finish(actor: Actor, walkId: number, input: { outcome: WalkFinish['outcome']; causeText: string | null; note: string | null }): Promise<void> {
      await knex.transaction(async (trx) => {
        const w = await findOpenLocked(trx, actor, walkId);
        if (w.status !== 'open') throw finishedRefusal();
        const doc = await pinnedDoc(w, () => trees.version(actor.shopId, w.tree_version_id, trx));
        const steps = await walks.steps(w.id, trx);
        const pos = positionOf(doc, steps, contextOf(w));
        const meta = doc.machine.states[pos.stepId].meta;
        let cause: { cause_step: string | null; cause_code: string | null; cause_text: string | null };
        if (meta.kind === 'cause') cause = { cause_step: pos.stepId, cause_code: meta.cause.code, cause_text: input.causeText ?? meta.title };
        else if (meta.kind === 'refer') cause = { cause_step: pos.stepId, cause_code: null, cause_text: input.causeText ?? `${meta.refer.to}: ${meta.refer.reason}` };
        else {
          if (input.outcome === 'fixed' && !input.causeText) {
            throw badRequest('This walk did not reach a cause step: say in a few words what the cause was.', { fields: { causeText: 'Say what the cause was.' } });
          }
          cause = { cause_step: null, cause_code: null, cause_text: input.causeText };
        }
        const now = new Date();
        await walks.update(trx, actor.shopId, w.id, {
          ...cause,
          status: 'finished',
          outcome: input.outcome,
          finish_note: input.note,
          finished_by: actor.id,
          finished_at: now,
          time_spent_s: timeSpentSeconds(w.started_at, steps.map((s) => s.created_at), now),
        });
      });
    },

    /** Adds a photo at a step of an open walk; refused photos leave nothing behind. */
    async addPhoto(actor: Actor, walkId: number, bytes: Buffer, fields: { step: string; caption?: string }, cap?: RecordCap): Promise<WalkPhoto> {
      const w = await walks.find(actor.shopId, walkId);
      if (!w) throw notFound('That walk');
      if (w.status !== 'open') throw finishedRefusal();
      const doc = await pinnedDoc(w, () => trees.version(actor.shopId, w.tree_version_id));
      if (!doc.machine.states[fields.step]) throw badRequest(`This tree has no step "${fields.step}".`, { fields: { step: 'Unknown step.' } });
      const saved = await photos.save(actor.shopId, actor.id, bytes, async (trx, photoId) => {
        const locked = await findOpenLocked(trx, actor, walkId);
        if (locked.status !== 'open') throw finishedRefusal();
        if (cap && (await walks.photoCount(trx, walkId)) >= cap.max) throw cap.refusal();
        const atSeq = await walks.recordCount(trx, walkId);
        await walks.linkPhoto(trx, { photo_id: photoId, walk_id: walkId, shop_id: actor.shopId, step_id: fields.step, at_seq: atSeq, caption: fields.caption || null });
      });
      const link = await walks.findPhotoLink(actor.shopId, walkId, saved.id);
      return toWalkPhoto({ ...link!, width: saved.width, height: saved.height });
    },

    /** Removes a photo from an open walk (and deletes it). */
    async removePhoto(actor: Actor, walkId: number, photoId: string): Promise<void> {
      const w = await walks.find(actor.shopId, walkId);
      if (!w) throw notFound('That walk');
      if (w.status !== 'open') throw finishedRefusal();
      if (!(await walks.findPhotoLink(actor.shopId, walkId, photoId))) throw notFound('That photo');
      await photos.remove(actor.shopId, photoId);
    },
  };
}

export type WalkService = ReturnType<typeof createWalkService>;
