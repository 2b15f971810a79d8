import type { ProjectCriterion } from '../schemas/content';

/** The meaning of each score, the same for every criterion; a criterion's own `scores[n]` says what it looks like. */
export const SCORE_WORDS = ['not shown', 'not yet', 'nearly', 'sound', 'exemplary'] as const;

export type Scores = Record<string, number>;
type Weighted = Pick<ProjectCriterion, 'key' | 'weight'>;

/** Weighted mean of the scores by criterion weight, on the 0-4 scale; null until every criterion has a score. */
export function weightedScore(criteria: Weighted[], scores: Scores): number | null {
  let sum = 0;
  let weights = 0;
  for (const c of criteria) {
    const s = scores[c.key];
    if (s === undefined) return null;
    sum += s * c.weight;
    weights += c.weight;
  }
  return weights === 0 ? null : sum / weights;
}

export interface Grade {
  weighted: number | null;
  /** Criteria without a score yet. */
  missing: string[];
  /** Criteria scored 0: the photographs do not show them, so the piece cannot pass whatever the mean. */
  notShown: string[];
  meetsPassMark: boolean;
  canPass: boolean;
}

/**
 * A piece may pass when every criterion is scored, none is "not shown", and the weighted score reaches the
 * project's pass mark. Rework may always be asked for. The server applies the same rule to refuse a pass.
 */
export function grade(criteria: Weighted[], scores: Scores, passMark: number): Grade {
  const weighted = weightedScore(criteria, scores);
  const missing = criteria.filter((c) => scores[c.key] === undefined).map((c) => c.key);
  const notShown = criteria.filter((c) => scores[c.key] === 0).map((c) => c.key);
  // A tolerance so that a mean printed as 3.00 is never refused against a pass mark of 3 by rounding error.
  const meetsPassMark = weighted !== null && weighted + 1e-9 >= passMark;
  return { weighted, missing, notShown, meetsPassMark, canPass: meetsPassMark && notShown.length === 0 };
}

/** Two decimals, the way scores are shown everywhere. */
export const formatScore = (score: number) => score.toFixed(2);
