import type { Knex } from 'knex';
import { parseTree, type WalkEvent } from '@/trees/engine';
import type { GuestWalkState, ShopContact } from '@/shared/schemas/guest-links';
import type { WalkDetail, WalkFinish, WalkPhoto, WalkStepAnswer } from '@/shared/schemas/walks';
import { createGuestLinkRepository, type GuestLinkWithShop } from '../repositories/guest-link-repository';
import { createWalkRepository } from '../repositories/walk-repository';
import { createWalkTreeRepository } from '../repositories/walk-tree-repository';
import { hashLinkToken } from '../auth/link-tokens';
import { guestLinkPath } from '../http/guest-access';
import { GUEST_CAPS } from '../http/guest-limits';
import { AppError, conflict, notFound } from '../errors';
import type { PhotoService } from './photo-service';
import type { WalkService } from './walk-service';

const contactOf = (l: GuestLinkWithShop): ShopContact => ({ name: l.shop_name, phone: l.contact_phone, email: l.contact_email });
const reach = (c: ShopContact) => [c.phone, c.email].filter(Boolean).join(' or ') || 'the shop';

/** Refusals a guest can act on; closed links carry the shop's contact for the page the guest sees. */
const guestErrors = {
  invalid: () => new AppError(404, 'link_invalid', 'This link is not valid. Check that the whole link was opened from the mail, or ask the shop for a new one.'),
  expired: (c: ShopContact) =>
    new AppError(410, 'link_expired', `This link has expired. To carry on, contact ${c.name}: ${reach(c)}.`, { shop: c }),
  revoked: (c: ShopContact) =>
    new AppError(410, 'link_revoked', `${c.name} has closed this link. To carry on, contact them: ${reach(c)}.`, { shop: c }),
  notStarted: () => conflict('Read and accept the safety notice first; the walk starts then.'),
  stepCap: () =>
    new AppError(429, 'guest_step_cap', `This walk has reached its limit of ${GUEST_CAPS.maxSteps} recorded steps. Call the shop to carry on; everything recorded so far is saved.`),
  photoCap: () =>
    new AppError(429, 'guest_photo_cap', `This walk already has ${GUEST_CAPS.maxPhotos} photos, the most a guest walk can hold. Remove one to add another, or call the shop.`),
};

/** The link is usable: not revoked, not expired. */
function checkOpen(l: GuestLinkWithShop): GuestLinkWithShop {
  if (l.revoked_at) throw guestErrors.revoked(contactOf(l));
  if (new Date(l.expires_at).getTime() <= Date.now()) throw guestErrors.expired(contactOf(l));
  return l;
}

/** Photo addresses a guest can load (the staff ones need a session); a job's staff notes are never shown. */
function forGuest(linkId: number, d: WalkDetail): WalkDetail {
  const base = guestLinkPath(linkId);
  return {
    ...d,
    job: null,
    photos: d.photos.map((p) => ({ ...p, url: `${base}/photos/${p.id}`, thumbUrl: `${base}/photos/${p.id}/thumb` })),
  };
}

/**
 * The guest's side of a link: open it by token (the route then binds the
 * browser with a cookie), acknowledge the safety notice (the walk starts),
 * and walk it through the same walk service staff use, with caps. Every call
 * re-checks that the link is still open.
 */
export function createGuestWalkService(knex: Knex, deps: { walks: WalkService; photos: PhotoService }) {
  const links = createGuestLinkRepository(knex);
  const walkRows = createWalkRepository(knex);

  async function openLink(linkId: number): Promise<GuestLinkWithShop> {
    const l = await links.findForGuest(linkId);
    if (!l) throw guestErrors.invalid();
    return checkOpen(l);
  }

  // Checked inside the walk's locked transaction, so two requests at once cannot both take the last place.
  const stepCap = { max: GUEST_CAPS.maxSteps, refusal: guestErrors.stepCap };
  const photoCap = { max: GUEST_CAPS.maxPhotos, refusal: guestErrors.photoCap };

  async function walkOf(linkId: number): Promise<{ link: GuestLinkWithShop; walkId: number; actor: { id: null; shopId: number } }> {
    const link = await openLink(linkId);
    if (!link.walk_id) throw guestErrors.notStarted();
    return { link, walkId: link.walk_id, actor: { id: null, shopId: link.shop_id } };
  }

  async function state(linkId: number): Promise<GuestWalkState> {
    const l = await openLink(linkId);
    return {
      linkId: l.id,
      customerName: l.customer_name,
      shop: contactOf(l),
      treeTitle: (await createWalkTreeRepository(knex).version(l.shop_id, l.tree_version_id))?.title ?? 'Guided check',
      expiresAt: new Date(l.expires_at).toISOString(),
      acknowledgedAt: l.acknowledged_at ? new Date(l.acknowledged_at).toISOString() : null,
      walk: l.walk_id ? forGuest(l.id, await deps.walks.get(l.shop_id, l.walk_id)) : null,
      limits: { ...GUEST_CAPS },
    };
  }

  return {
    /** Opens a link by its token: answers the link id and expiry for the binding cookie. */
    async open(token: string): Promise<{ linkId: number; expiresAt: Date }> {
      const l = await links.findByTokenHash(hashLinkToken(token));
      if (!l) throw guestErrors.invalid();
      checkOpen(l);
      await links.markOpened(l.shop_id, l.id, new Date());
      return { linkId: l.id, expiresAt: new Date(l.expires_at) };
    },

    state,

    /** The guest accepted the safety notice: the walk starts on the pinned version (once, even if sent twice). */
    async acknowledge(linkId: number): Promise<GuestWalkState> {
      const l = await openLink(linkId);
      await knex.transaction(async (trx) => {
        const locked = await links.lock(trx, l.shop_id, l.id);
        if (!locked || locked.walk_id) return;
        const tree = await createWalkTreeRepository(trx).version(l.shop_id, l.tree_version_id, trx);
        const parsed = tree && parseTree(tree.doc);
        if (!tree || !parsed || !parsed.ok) throw new AppError(409, 'tree_invalid', `This check cannot be started right now. Please contact ${l.shop_name}: ${reach(contactOf(l))}.`);
        const walksInTrx = createWalkRepository(trx);
        const shop = await walksInTrx.shop(l.shop_id);
        const walkId = await walksInTrx.insert({
          shop_id: l.shop_id,
          job_id: null,
          tree_id: tree.treeId,
          tree_version_id: tree.versionId,
          altitude_m: shop?.altitude_m ?? 0,
          baro_kpa: null,
          started_by: null,
          current_step: parsed.doc.machine.initial,
        });
        await links.update(l.shop_id, l.id, { acknowledged_at: new Date(), walk_id: walkId }, trx);
      });
      return state(linkId);
    },

    async step(linkId: number, input: { stepId: string; event: WalkEvent; note: string | null }): Promise<WalkStepAnswer> {
      const { walkId, actor } = await walkOf(linkId);
      return deps.walks.step(actor, walkId, input, stepCap);
    },

    async undo(linkId: number, input: { stepId: string }): Promise<WalkStepAnswer> {
      const { walkId, actor } = await walkOf(linkId);
      return deps.walks.undo(actor, walkId, input, stepCap);
    },

    async finish(linkId: number, input: { outcome: WalkFinish['outcome']; causeText: string | null; note: string | null }): Promise<GuestWalkState> {
      const { walkId, actor } = await walkOf(linkId);
      await deps.walks.finish(actor, walkId, input);
      return state(linkId);
    },

    async addPhoto(linkId: number, bytes: Buffer, fields: { step: string; caption?: string }): Promise<WalkPhoto> {
      const { walkId, actor } = await walkOf(linkId);
      // Refused early when already full (no image work), and again inside the walk's lock for the last place.
      if ((await walkRows.photoCount(knex, walkId)) >= GUEST_CAPS.maxPhotos) throw guestErrors.photoCap();
      const photo = await deps.walks.addPhoto(actor, walkId, bytes, fields, photoCap);
      const base = guestLinkPath(linkId);
      return { ...photo, url: `${base}/photos/${photo.id}`, thumbUrl: `${base}/photos/${photo.id}/thumb` };
    },

    async removePhoto(linkId: number, photoId: string): Promise<void> {
      const { walkId, actor } = await walkOf(linkId);
      await deps.walks.removePhoto(actor, walkId, photoId);
    },

    /** A photo of this guest's own walk only. */
    async readPhoto(linkId: number, photoId: string, variant: 'full' | 'thumb') {
      const { link, walkId } = await walkOf(linkId);
      if (!(await links.walkHasPhoto(link.shop_id, walkId, photoId))) throw notFound('That photo');
      return deps.photos.read(link.shop_id, photoId, variant);
    },
  };
}

export type GuestWalkService = ReturnType<typeof createGuestWalkService>;
