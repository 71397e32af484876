import type { Knex } from 'knex';
import type { JobInputParsed } from '@/shared/schemas/jobs';
import type { GuestLink, GuestLinkCreateParsed, GuestLinkDetail, GuestLinkIssued, GuestLinkJobAnswer, GuestLinkStatus } from '@/shared/schemas/guest-links';
import type { SessionUser } from '../http/access';
import { createGuestLinkRepository, type GuestLinkRecord } from '../repositories/guest-link-repository';
import { createWalkTreeRepository } from '../repositories/walk-tree-repository';
import { createShopRepository } from '../repositories/shop-repository';
import { createUserRepository } from '../repositories/user-repository';
import { newLinkToken } from '../auth/link-tokens';
import type { Mailer } from '../mail/mailer';
import { AppError, badRequest, conflict, notFound } from '../errors';
import { createJobService } from './job-service';
import type { WalkService } from './walk-service';
import { guestLinkMail } from './guest-mail';

const DAY_MS = 24 * 60 * 60 * 1000;
const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
const person = (id: number | null, name: string | null) => (id ? { id, name: name ?? 'Former staff' } : null);

/** Where a link stands: revoked and finished outrank expiry, so a finished walk stays "finished". */
export function guestLinkStatus(r: Pick<GuestLinkRecord, 'revoked_at' | 'walk_status' | 'expires_at' | 'opened_at'>, now = Date.now()): GuestLinkStatus {
  if (r.revoked_at) return 'revoked';
  if (r.walk_status === 'finished') return 'finished';
  if (new Date(r.expires_at).getTime() <= now) return 'expired';
  return r.opened_at ? 'in_progress' : 'not_opened';
}

/** A link as staff see it (never its token, which is not kept). */
export function toGuestLink(r: GuestLinkRecord): GuestLink {
  return {
    id: r.id,
    status: guestLinkStatus(r),
    customerName: r.customer_name,
    customerEmail: r.customer_email,
    note: r.note,
    tree: { id: r.tree_id, versionId: r.tree_version_id, version: r.tree_version, title: r.tree_title },
    createdBy: person(r.created_by, r.created_by_name),
    createdAt: new Date(r.created_at).toISOString(),
    expiresAt: new Date(r.expires_at).toISOString(),
    lastSentAt: iso(r.last_sent_at),
    sentCount: Number(r.sent_count),
    openedAt: iso(r.opened_at),
    acknowledgedAt: iso(r.acknowledged_at),
    revokedAt: iso(r.revoked_at),
    handledAt: iso(r.handled_at),
    handledBy: person(r.handled_by, r.handled_by_name),
    walk:
      r.walk_id && r.walk_status
        ? {
            id: r.walk_id,
            status: r.walk_status,
            outcome: r.walk_outcome,
            stepCount: Number(r.walk_step_count ?? 0),
            causeText: r.walk_cause_text,
            lastStepAt: iso(r.walk_last_step_at),
            finishedAt: iso(r.walk_finished_at),
          }
        : null,
    jobId: r.job_id,
  };
}

const mailFailed = () =>
  new AppError(502, 'mail_failed', 'The link could not be e-mailed: the mail server did not accept it. Nothing was sent; try again in a moment, or copy the link instead.');

/** Guest links as support, leads and owners manage them: create, send, list, revoke, resend, review, turn into a job. */
export function createGuestLinkService(knex: Knex, deps: { mailer: Mailer; linkOrigin: (requestOrigin: string) => string; walks: WalkService }) {
  const links = createGuestLinkRepository(knex);
  const trees = createWalkTreeRepository(knex);
  const shops = createShopRepository(knex);
  const users = createUserRepository(knex);

  async function record(shopId: number, id: number): Promise<GuestLinkRecord> {
    const r = await links.find(shopId, id);
    if (!r) throw notFound('That guest link');
    return r;
  }

  /** E-mails a link; false when the mail server refused it. */
  async function mail(actor: SessionUser, r: GuestLinkRecord, url: string): Promise<boolean> {
    const [shop, sender] = await Promise.all([shops.findById(actor.shopId), users.findInShop(actor.shopId, actor.id)]);
    if (!shop || !r.customer_email) return false;
    try {
      await deps.mailer.send(
        guestLinkMail({
          to: r.customer_email,
          shopName: shop.name,
          customerName: r.customer_name,
          senderName: sender?.name ?? shop.name,
          treeTitle: r.tree_title,
          url,
          expiresAt: new Date(r.expires_at),
          contact: { phone: shop.contact_phone, email: shop.contact_email },
        }),
      );
      return true;
    } catch {
      return false;
    }
  }

  const urlFor = (requestOrigin: string, token: string) => `${deps.linkOrigin(requestOrigin)}/g/${token}`;

  return {
    async list(shopId: number, status?: GuestLinkStatus): Promise<GuestLink[]> {
      const all = (await links.list(shopId)).map(toGuestLink);
      return status ? all.filter((l) => l.status === status) : all;
    },

    /** The link and its walk (steps, readings, photos, outcome), for the support inbox. */
    async detail(shopId: number, id: number): Promise<GuestLinkDetail> {
      const r = await record(shopId, id);
      return { link: toGuestLink(r), walk: r.walk_id ? await deps.walks.get(shopId, r.walk_id) : null };
    },

    /** Creates a link to the tree's published version (pinned now) and e-mails it when asked. The token is answered once. */
    async create(actor: SessionUser, input: GuestLinkCreateParsed, requestOrigin: string): Promise<GuestLinkIssued> {
      const tree = await trees.latestPublished(actor.shopId, input.treeId);
      if (!tree) throw conflict('That tree has no published version, so it cannot be sent. Pick another tree or ask a lead to publish it.', { fields: { treeId: 'Pick a published tree.' } });
      const { token, hash } = newLinkToken();
      const id = await links.create({
        shop_id: actor.shopId,
        tree_id: tree.treeId,
        tree_version_id: tree.versionId,
        customer_name: input.customerName,
        customer_email: input.customerEmail,
        note: input.note,
        token_hash: hash,
        expires_at: new Date(Date.now() + input.expiresInDays * DAY_MS),
        created_by: actor.id,
      });
      const url = urlFor(requestOrigin, token);
      if (input.send) {
        if (!(await mail(actor, await record(actor.shopId, id), url))) {
          // A link nobody received is withdrawn, so the list only shows links that went out.
          await links.update(actor.shopId, id, { revoked_at: new Date(), revoked_by: actor.id });
          throw mailFailed();
        }
        await links.update(actor.shopId, id, { last_sent_at: new Date(), sent_count: 1 });
      }
      return { link: toGuestLink(await record(actor.shopId, id)), url, mailed: input.send };
    },

    /**
     * A fresh link for the same customer and walk, e-mailed or to copy. Only a
     * hash is kept, so the old address cannot be sent again: it stops working
     * (a browser already bound to the walk keeps its place).
     */
    async resend(actor: SessionUser, id: number, by: 'email' | 'copy', requestOrigin: string): Promise<GuestLinkIssued> {
      const r = await record(actor.shopId, id);
      const status = guestLinkStatus(r);
      if (status === 'revoked' || status === 'expired') throw conflict(`This link is ${status}, so it cannot be sent again. Create a new link for the customer instead.`);
      if (by === 'email' && !r.customer_email) throw badRequest('This link has no e-mail address. Copy the link instead, or create a new link with the address.');
      const { token, hash } = newLinkToken();
      await links.update(actor.shopId, id, { token_hash: hash });
      const url = urlFor(requestOrigin, token);
      if (by === 'email') {
        if (!(await mail(actor, r, url))) {
          // Nothing went out: the address sent before keeps working.
          await links.update(actor.shopId, id, { token_hash: r.token_hash });
          throw mailFailed();
        }
        await links.update(actor.shopId, id, { last_sent_at: new Date(), sent_count: Number(r.sent_count) + 1 });
      }
      return { link: toGuestLink(await record(actor.shopId, id)), url, mailed: by === 'email' };
    },

    /** Stops the link at once: its address and any browser bound to it are refused from now on. */
    async revoke(actor: SessionUser, id: number): Promise<GuestLink> {
      const r = await record(actor.shopId, id);
      if (!r.revoked_at) await links.update(actor.shopId, id, { revoked_at: new Date(), revoked_by: actor.id });
      return toGuestLink(await record(actor.shopId, id));
    },

    async setHandled(actor: SessionUser, id: number, handled: boolean): Promise<GuestLink> {
      await record(actor.shopId, id);
      await links.update(actor.shopId, id, handled ? { handled_at: new Date(), handled_by: actor.id } : { handled_at: null, handled_by: null });
      return toGuestLink(await record(actor.shopId, id));
    },

    /** The customer brought the car in: a job is created and the guest walk joins it (one transaction). */
    async toJob(actor: SessionUser, id: number, input: JobInputParsed): Promise<GuestLinkJobAnswer> {
      const jobId = await knex.transaction(async (trx) => {
        const link = await links.lock(trx, actor.shopId, id);
        if (!link) throw notFound('That guest link');
        if (link.job_id) throw conflict('This guest walk is already part of a job. Open that job instead.');
        if (!link.walk_id) throw conflict('The customer has not started this walk yet, so there is nothing to add to a job.');
        // The job service on the transaction: its own transaction becomes a savepoint inside this one.
        const job = await createJobService(trx).create(actor.shopId, actor.id, input);
        await links.setWalkJob(trx, actor.shopId, link.walk_id, job.id);
        await links.update(actor.shopId, id, { job_id: job.id, handled_at: link.handled_at ?? new Date(), handled_by: link.handled_by ?? actor.id }, trx);
        return job.id;
      });
      const job = await createJobService(knex).get(actor.shopId, jobId);
      return { link: toGuestLink(await record(actor.shopId, id)), job };
    },
  };
}

export type GuestLinkService = ReturnType<typeof createGuestLinkService>;
