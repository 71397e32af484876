import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Knex } from 'knex';
import type { SessionUser } from '../http/access';
import { createUserRepository } from '../repositories/user-repository';
import { hashPassword, verifyPassword } from './passwords';
import { identityCache } from './identity-cache';

// Compared when the e-mail is unknown, so both answers take the same time.
let dummyHash: Promise<string> | undefined;
const unknownUserHash = () => (dummyHash ??= hashPassword(`no-such-user-${Math.random()}`));

/** A passport instance: password sign-in, and the session user reloaded on every request. */
export function createPassport(knex: Knex) {
  const users = createUserRepository(knex);
  const recent = identityCache(knex).users;
  const passport = new Passport();

  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await users.findByEmail(email);
        const ok = await verifyPassword(password, user?.password_hash ?? (await unknownUserHash()));
        if (!user || !ok || !user.active) return done(null, false);
        done(null, { id: user.id, shopId: user.shop_id, role: user.role } satisfies SessionUser);
      } catch (err) {
        done(err);
      }
    }),
  );

  passport.serializeUser((user, done) => done(null, (user as SessionUser).id));

  // Reloaded at most once a second per process, and at once after a change made through it (identity-cache.ts).
  passport.deserializeUser(async (id: number, done) => {
    try {
      const user = await recent.get(id, () => users.findForSession(id));
      if (!user || !user.active) return done(null, false);
      done(null, { id: user.id, shopId: user.shop_id, role: user.role, name: user.name, email: user.email, shopName: user.shop_name });
    } catch (err) {
      done(err);
    }
  });

  return passport;
}
