import type { Knex } from 'knex';
import type { Role } from '@/shared/roles';

export interface InvitationRow {
  id: number;
  shop_id: number;
  email: string;
  role: Role;
  token_hash: string;
  invited_by: number | null;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

/** Invitations table access; owner-facing reads are scoped by shop, token reads by the token's hash. */
export function createInvitationRepository(knex: Knex) {
  return {
    async create(row: Pick<InvitationRow, 'shop_id' | 'email' | 'role' | 'token_hash' | 'invited_by' | 'expires_at'>, trx: Knex = knex): Promise<number> {
      const [id] = await trx('invitations').insert(row);
      return id as number;
    },
    /** Pending (not accepted, not revoked, not expired) invitations of a shop, newest first, with the inviter's name. */
    async listPending(shopId: number, now: Date): Promise<Array<InvitationRow & { invited_by_name: string | null }>> {
      return knex('invitations as i')
        .leftJoin('users as u', 'u.id', 'i.invited_by')
        .where('i.shop_id', shopId)
        .whereNull('i.accepted_at')
        .whereNull('i.revoked_at')
        .where('i.expires_at', '>', now)
        .orderBy('i.created_at', 'desc')
        .select('i.*', 'u.name as invited_by_name');
    },
    /** Revokes a shop's open invitations for an address (a new one replaces them). */
    async revokeOpenFor(shopId: number, email: string, now: Date, trx: Knex = knex): Promise<void> {
      await trx('invitations').where({ shop_id: shopId, email }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: now });
    },
    /** Revokes one invitation of the shop; answers whether an open one was revoked. */
    async revoke(shopId: number, id: number, now: Date): Promise<boolean> {
      const n = await knex('invitations').where({ shop_id: shopId, id }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: now });
      return n > 0;
    },
    async findInShop(shopId: number, id: number): Promise<InvitationRow | undefined> {
      return knex<InvitationRow>('invitations').where({ shop_id: shopId, id }).first();
    },
    /** The invitation behind a link, with its shop's name. */
    async findByTokenHash(tokenHash: string, trx: Knex = knex): Promise<(InvitationRow & { shop_name: string }) | undefined> {
      return trx('invitations as i').join('shops as s', 's.id', 'i.shop_id').where('i.token_hash', tokenHash).first('i.*', 's.name as shop_name');
    },
    /** Marks an invitation used; false when another request used it first. */
    async markAccepted(id: number, now: Date, trx: Knex = knex): Promise<boolean> {
      const n = await trx('invitations').where({ id }).whereNull('accepted_at').whereNull('revoked_at').update({ accepted_at: now });
      return n === 1;
    },
  };
}
