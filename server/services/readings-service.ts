import { assessReadings, type ReadingsCheckResult } from '@/shared/readings';
import type { ReadingsCheckParsed } from '@/shared/schemas/readings';
import { badRequest } from '../errors';

/** The readings check on the server: the same shared functions the screen runs, so both always agree. */
export function createReadingsService() {
  return {
    /** Judges vacuum or MAP and fuel trims; impossible values answer 400 naming every bad field. */
    check(input: ReadingsCheckParsed): ReadingsCheckResult {
      const { result, errors } = assessReadings(input);
      const fields = Object.keys(errors);
      if (fields.length > 0 || !result) {
        throw badRequest(errors[fields[0]] ?? 'The readings could not be checked.', { fields: errors });
      }
      return result;
    },
  };
}
