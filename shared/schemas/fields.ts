import { z } from 'zod';

/** Optional free text: trimmed, capped, and an empty answer stored as null. */
export const optionalText = (max: number, tooLong: string) =>
  z
    .string()
    .trim()
    .max(max, tooLong)
    .nullish()
    .transform((v) => (v ? v : null));
