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
  };
}

export type Config = ReturnType<typeof loadConfig>;
