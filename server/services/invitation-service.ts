import type { Knex } from 'knex';
import type { AcceptInvitation, Invitation, InvitationLookupAnswer, Invite } from '@/shared/schemas/people';
import type { SessionUser } from '../http/access';
import { createInvitationRepository, type InvitationRow } from '../repositories/invitation-repository';
import { createUserRepository } from '../repositories/user-repository';
import { createShopRepository } from '../repositories/shop-repository';
import { hashLinkToken, linkTo, newLinkToken } from '../auth/link-tokens';
import { hashPassword } from '../auth/passwords';
import type { Mailer } from '../mail/mailer';
import { invitationMail } from '../mail/templates';
import { AppError, conflict, notFound } from '../errors';
import { EMAIL_TAKEN } from './auth-service';
import { linkErrors } from './link-errors';

export const INVITATION_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;
const ACCOUNT_EXISTS = 'That address already has a Baywalk account, so it cannot be invited. Use another address.';

function toInvitation(row: InvitationRow & { invited_by_name?: string | null }): Invitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedBy: row.invited_by_name ?? null,
    createdAt: new Date(row.created_at).toISOString(),
    expiresAt: new Date(row.expires_at).toISOString(),
  };
}

/** Invitations: the owner sends them; the invited person looks one up and accepts it. */
export function createInvitationService(knex: Knex, deps: { mailer: Mailer; linkOrigin: (requestOrigin: string) => string }) {
  const invitations = createInvitationRepository(knex);
  const users = createUserRepository(knex);
  const shops = createShopRepository(knex);

  /** The invitation behind a token, refused with a clear reason when it cannot be used. */
  async function usable(token: string, trx: Knex = knex) {
    const row = await invitations.findByTokenHash(hashLinkToken(token), trx);
    if (!row) throw linkErrors.invalid('invitation');
    if (row.revoked_at) throw linkErrors.revoked();
    if (row.accepted_at) throw linkErrors.used('invitation');
    if (new Date(row.expires_at).getTime() <= Date.now()) throw linkErrors.expired('invitation');
    return row;
  }

  return {
    async listPending(shopId: number): Promise<Invitation[]> {
      return (await invitations.listPending(shopId, new Date())).map(toInvitation);
    },

    /** Creates a 7-day single-use invitation (replacing open ones for the address) and e-mails the link. */
    async invite(actor: SessionUser, input: Invite, requestOrigin: string): Promise<Invitation> {
      if (await users.findByEmail(input.email)) throw conflict(ACCOUNT_EXISTS, { fields: { email: ACCOUNT_EXISTS } });
      const shop = await shops.findById(actor.shopId);
      const inviter = await users.findInShop(actor.shopId, actor.id);
      if (!shop || !inviter) throw notFound('Your shop');
      const { token, hash } = newLinkToken();
      const now = new Date();
      const expiresAt = new Date(now.getTime() + INVITATION_DAYS * DAY_MS);
      const id = await knex.transaction(async (trx) => {
        await invitations.revokeOpenFor(actor.shopId, input.email, now, trx);
        return invitations.create({ shop_id: actor.shopId, email: input.email, role: input.role, token_hash: hash, invited_by: actor.id, expires_at: expiresAt }, trx);
      });
      const url = linkTo(deps.linkOrigin(requestOrigin), '/accept-invite', token);
      try {
        await deps.mailer.send(invitationMail({ to: input.email, shopName: shop.name, invitedBy: inviter.name, role: input.role, url, expiresAt }));
      } catch {
        // An invitation nobody received is withdrawn, so the list shows only ones that went out.
        await invitations.revoke(actor.shopId, id, new Date());
        throw new AppError(502, 'mail_failed', 'The invitation could not be e-mailed: the mail server did not accept it. Nothing was sent; try again in a moment.');
      }
      const row = await invitations.findInShop(actor.shopId, id);
      return toInvitation({ ...row!, invited_by_name: inviter.name });
    },

    async revoke(shopId: number, id: number): Promise<void> {
      if (!(await invitations.revoke(shopId, id, new Date()))) throw notFound('That invitation');
    },

    /** What a link is for, so the accept screen can greet the person. */
    async lookup(token: string): Promise<InvitationLookupAnswer> {
      const row = await usable(token);
      return { email: row.email, role: row.role, shopName: row.shop_name };
    },

    /** Creates the account from the invitation (once) and answers who to sign in. */
    async accept(input: AcceptInvitation): Promise<SessionUser> {
      const passwordHash = await hashPassword(input.password);
      try {
        return await knex.transaction(async (trx) => {
          const row = await usable(input.token, trx);
          if (await users.findByEmail(row.email)) throw conflict(EMAIL_TAKEN);
          if (!(await invitations.markAccepted(row.id, new Date(), trx))) throw linkErrors.used('invitation');
          const id = await users.create({ shop_id: row.shop_id, email: row.email, name: input.name, role: row.role, password_hash: passwordHash }, trx);
          return { id, shopId: row.shop_id, role: row.role };
        });
      } catch (err) {
        // Two accepts at the same moment: the unique e-mail index lets one through.
        if ((err as { errno?: number }).errno === 1062) throw linkErrors.used('invitation');
        throw err;
      }
    },
  };
}
