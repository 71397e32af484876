/// <reference types="node" />
import path from 'node:path';

/** Reads the server's settings from the environment, with local defaults. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env) {
  const root = path.resolve(__dirname, '..');
  const dataDir = env.BAYWALK_DATA_DIR ?? path.join(root, '.data');
  return {
    root,
    dataDir,
    production: env.NODE_ENV === 'production',
    port: Number(env.PORT ?? 8080),
    host: env.HOST ?? '127.0.0.1',
    distDir: env.BAYWALK_DIST_DIR ?? path.join(root, 'dist'),
    /** Where the local photo store keeps files (an S3-compatible store can replace it). */
    photosDir: env.BAYWALK_PHOTOS_DIR ?? path.join(dataDir, 'photos'),
    /** Set when the app is served over HTTPS so cookies get `secure`. */
    secureCookies: env.BAYWALK_SECURE_COOKIES === '1',
    sessionSecret: env.BAYWALK_SESSION_SECRET ?? 'baywalk-local-development-secret',
    db: {
      host: env.BAYWALK_DB_HOST ?? '127.0.0.1',
      port: Number(env.BAYWALK_DB_PORT ?? 3307),
      user: env.BAYWALK_DB_USER ?? 'baywalk',
      password: env.BAYWALK_DB_PASSWORD ?? 'baywalk-local',
      database: env.BAYWALK_DB_NAME ?? 'baywalk',
    },
    logLevel: env.BAYWALK_LOG_LEVEL ?? (env.NODE_ENV === 'test' ? 'silent' : 'info'),
    /**
     * The address people reach Baywalk at, used in e-mailed links. Required in
     * production (a link built from the request's Host header could be forged);
     * elsewhere links use the address the request came to.
     */
    publicUrl: env.BAYWALK_PUBLIC_URL?.replace(/\/+$/, '') || undefined,
    /** Outgoing mail. Outside production the default is the local catcher on loopback. */
    smtp: {
      host: env.BAYWALK_SMTP_HOST ?? '127.0.0.1',
      port: Number(env.BAYWALK_SMTP_PORT ?? 2525),
      user: env.BAYWALK_SMTP_USER || undefined,
      pass: env.BAYWALK_SMTP_PASS || undefined,
      /** `1` for SMTPS (implicit TLS, usually port 465); otherwise STARTTLS when the server offers it. */
      secure: env.BAYWALK_SMTP_SECURE === '1',
      from: env.BAYWALK_SMTP_FROM ?? 'Baywalk <no-reply@baywalk.localhost>',
    },
    /** The server starts the local SMTP catcher itself: never in production, and not when a real SMTP host is set. */
    mailCatcher: env.NODE_ENV !== 'production' && !env.BAYWALK_SMTP_HOST,
    /** Where the catcher keeps caught mail (one .eml file each) for the development mail page. */
    mailDir: env.BAYWALK_MAIL_DIR ?? path.join(dataDir, 'mail'),
    /**
     * Rate limits on sign-in and password-reset requests, per IP and per
     * account. Failed sign-ins count, successful ones do not. Under
     * NODE_ENV=test the defaults are 1000 times higher so suites that sign in
     * many times from 127.0.0.1 never trip them; rate-limit tests pass low
     * limits to createTestApp.
     */
    rateLimits: rateLimits(env),
  };
}

function rateLimits(env: NodeJS.ProcessEnv) {
  const scale = env.NODE_ENV === 'test' ? 1000 : 1;
  const n = (name: string, fallback: number) => Number(env[name] ?? fallback * scale);
  return {
    signInWindowMs: 15 * 60_000,
    signInPerIp: n('BAYWALK_SIGNIN_LIMIT_IP', 30),
    signInPerAccount: n('BAYWALK_SIGNIN_LIMIT_ACCOUNT', 8),
    resetWindowMs: 60 * 60_000,
    resetPerIp: n('BAYWALK_RESET_LIMIT_IP', 10),
    resetPerAccount: n('BAYWALK_RESET_LIMIT_ACCOUNT', 3),
    signUpWindowMs: 60 * 60_000,
    signUpPerIp: n('BAYWALK_SIGNUP_LIMIT_IP', 10),
  };
}

export type Config = ReturnType<typeof loadConfig>;
