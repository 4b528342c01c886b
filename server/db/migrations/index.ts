import type { QueryInterface } from 'sequelize';
import * as foundation from './001-foundation';
import * as apiTokens from './002-api-tokens';
import * as readingsImports from './003-readings-imports';
import * as batchesProfiles from './004-batches-profiles';
import * as alerts from './005-alerts';
import * as season from './006-season';
import * as readingBlocks from './007-reading-blocks';
import * as importStoredSpan from './008-import-stored-span';

export interface Migration {
  name: string;
  up(qi: QueryInterface): Promise<void>;
  down(qi: QueryInterface): Promise<void>;
}

/** Applied in this order; append new migrations, never reorder or edit applied ones. */
export const migrations: Migration[] = [
  { name: '001-foundation', ...foundation },
  { name: '002-api-tokens', ...apiTokens },
  { name: '003-readings-imports', ...readingsImports },
  { name: '004-batches-profiles', ...batchesProfiles },
  { name: '005-alerts', ...alerts },
  { name: '006-season', ...season },
  { name: '007-reading-blocks', ...readingBlocks },
  { name: '008-import-stored-span', ...importStoredSpan },
];
