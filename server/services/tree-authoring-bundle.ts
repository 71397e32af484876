import type { Knex } from 'knex';
import { createTreeAuthoringService } from './tree-authoring-service';
import { createTreeFilesService } from './tree-authoring-files';
import { createTreeStatsService } from './tree-stats-service';

/** Tree authoring services: drafts and publishing, files and history, step statistics. */
export function createTreeAuthoringBundle(knex: Knex) {
  return {
    treeAuthoring: createTreeAuthoringService(knex),
    treeFiles: createTreeFilesService(knex),
    treeStats: createTreeStatsService(knex),
  };
}
