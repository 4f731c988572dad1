import { SAMPLE_QUANTITIES } from '../load/canonical.js';

/** One measured quantity of the sample table ('dissolved_fe', 'nitrate', 'phosphate', 'silicate'). */
export type SampleQuantity = (typeof SAMPLE_QUANTITIES)[number];
