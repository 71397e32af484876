/// <reference types="node" />
import path from 'node:path';
import type { Knex } from 'knex';
import type { Config } from '../config';
import { createPhotoStore } from '../photos';
import { createPhotoService } from './photo-service';
import { createWalkService } from './walk-service';
import { createReportService } from './report-service';

/** Photos, walks and walk reports, built together because walks store photos and reports read both. */
export function createWalkBundle(knex: Knex, config: Config) {
  const photos = createPhotoService(knex, createPhotoStore(config));
  const walks = createWalkService(knex, photos);
  const reports = createReportService({ walks, photos, fontsDir: path.join(config.root, 'assets', 'fonts') });
  return { photos, walks, reports };
}
