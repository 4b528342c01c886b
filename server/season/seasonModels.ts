import { Planting } from './planting.model';
import { TakeAssessment } from './takeAssessment.model';

/** The season's tables, bound by initModels. */
export const SEASON_MODELS = [Planting, TakeAssessment];
