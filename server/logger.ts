import pino from 'pino';

/** Structured JSON logs; passwords, cookies and tokens are redacted. */
export function createLogger(level: string) {
  return pino({
    level,
    redact: {
      paths: ['req.headers.cookie', 'req.headers.authorization', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]', '*.password', '*.token'],
      censor: '[hidden]',
    },
  });
}

export type Logger = ReturnType<typeof createLogger>;
