import { describe, expect, it } from 'vitest';
import { grade, SCORE_WORDS, weightedScore } from '../../../shared/grading/score';

const criteria = [
  { key: 'uprightness', weight: 3 },
  { key: 'fit', weight: 3 },
  { key: 'finish', weight: 2 },
  { key: 'sink', weight: 2 },
];

describe('grading', () => {
  it('when every criterion is scored, then the weighted score is the mean weighted by criterion weight', () => {
    // (4*3 + 3*3 + 2*2 + 3*2) / 10 = 31 / 10 = 3.1 (computed)
    expect(weightedScore(criteria, { uprightness: 4, fit: 3, finish: 2, sink: 3 })).toBeCloseTo(3.1, 12);
  });

  it('when a criterion has no score, then there is no weighted score and it is listed as missing', () => {
    expect(weightedScore(criteria, { uprightness: 4 })).toBeNull();
    expect(grade(criteria, { uprightness: 4, fit: 4 }, 3)).toMatchObject({
      weighted: null,
      missing: ['finish', 'sink'],
      canPass: false,
    });
  });

  it('when the weighted score equals the pass mark exactly, then the piece may pass', () => {
    expect(grade(criteria, { uprightness: 3, fit: 3, finish: 3, sink: 3 }, 3)).toMatchObject({
      meetsPassMark: true,
      canPass: true,
    });
  });

  it('when the mean is high but a criterion is scored 0, then the piece cannot pass', () => {
    // (4*3 + 4*3 + 4*2 + 0*2) / 10 = 3.2 (computed), above the pass mark of 3 but with "sink" not shown.
    expect(grade(criteria, { uprightness: 4, fit: 4, finish: 4, sink: 0 }, 3)).toMatchObject({
      meetsPassMark: true,
      notShown: ['sink'],
      canPass: false,
    });
  });

  it('when below the pass mark, then the piece cannot pass', () => {
    expect(grade(criteria, { uprightness: 3, fit: 3, finish: 2, sink: 2 }, 3).canPass).toBe(false);
  });

  it('when the scale is read, then it has the five words of the product', () => {
    expect(SCORE_WORDS).toEqual(['not shown', 'not yet', 'nearly', 'sound', 'exemplary']);
  });
});
