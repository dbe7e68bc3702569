import type { Comparison, Report } from './reportModel.js';

/**
 * What the renderers read: the report as it is. (A named view, so that parts the engine adds
 * later can be read as optional fields without touching every renderer.)
 */
export type ReportView = Report;

export type ComparisonView = Comparison;
