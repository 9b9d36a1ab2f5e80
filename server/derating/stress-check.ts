import { CAUTION_TEXT } from './caution';
import { checksFor } from './checks';
import type { StressPolicy } from './policies';
import { worstStatus } from './status';
import {
  CHECKED_CATEGORIES,
  type CheckResult,
  type CheckedCategory,
  type Maybe,
  type OperatingPoint,
  type StressStatus,
} from './types';

export interface StressLineInput {
  lineId: string;
  refDes?: Maybe<string>;
  partId?: Maybe<string>;
  /** The part's category; lines of categories without checks (or without a part) are left out. */
  category?: Maybe<string>;
  ratings?: Maybe<object>;
  operatingPoint?: Maybe<OperatingPoint>;
}

export interface StressLineResult {
  lineId: string;
  refDes: string | null;
  partId: string | null;
  category: CheckedCategory;
  status: StressStatus;
  checks: CheckResult[];
}

export interface StressSummary {
  clear: number;
  close: number;
  beyondPolicy: number;
  overRating: number;
  needsData: number;
}

export interface StressCheckResult {
  policyId: string;
  lines: StressLineResult[];
  /** Lines (not checks) by status. */
  summary: StressSummary;
  caution: string;
}

function isChecked(category: Maybe<string>): category is CheckedCategory {
  return CHECKED_CATEGORIES.some((c) => c === category);
}

const SUMMARY_KEY: Record<StressStatus, keyof StressSummary> = {
  clear: 'clear',
  close: 'close',
  beyond_policy: 'beyondPolicy',
  over_rating: 'overRating',
  needs_data: 'needsData',
};

/** The stress check of a BOM: each checked line takes its worst check; the summary counts lines. */
export function checkBom(input: {
  lines: readonly StressLineInput[];
  policy: StressPolicy;
  bomAmbientC: Maybe<number>;
}): StressCheckResult {
  const summary: StressSummary = { clear: 0, close: 0, beyondPolicy: 0, overRating: 0, needsData: 0 };
  const lines: StressLineResult[] = [];
  for (const line of input.lines) {
    if (!isChecked(line.category)) continue;
    const checks = checksFor(line.category, line.ratings, line.operatingPoint, input.bomAmbientC, input.policy);
    const status = worstStatus(checks.map((c) => c.status));
    summary[SUMMARY_KEY[status]] += 1;
    lines.push({
      lineId: line.lineId,
      refDes: line.refDes ?? null,
      partId: line.partId ?? null,
      category: line.category,
      status,
      checks,
    });
  }
  return { policyId: input.policy.id, lines, summary, caution: CAUTION_TEXT };
}
