import { describe, expect, it } from 'vitest';
import { analyzeMatrix } from '../../../models/matrix/analysis';
import { KILLER_WHALE, LOGGERHEAD, TEASEL, mathjsPerronRoot, powerIterationLambda } from './fixtures';

describe('loggerhead sea turtle (Crouse, Crowder & Caswell 1987)', () => {
  const result = analyzeMatrix(LOGGERHEAD);

  it('reproduces the published λ = 0.9450', () => {
    // Crouse et al. 1987, Ecology 68:1412–1423, text and Table 4: λ = 0.9450 (value recalled from memory).
    expect(result.lambda.toFixed(4)).toBe('0.9450');
  });

  it('reproduces the published stable stage distribution (percent)', () => {
    // Crouse et al. 1987, Table 5, dominant right eigenvector in percent (table number and values
    // recalled from memory): eggs 20.65, small juveniles 66.975, large juveniles 11.46,
    // subadults 0.66, mature breeders 0.18.
    const percent = result.stableStage.map((x) => 100 * x);
    expect(percent[0].toFixed(2)).toBe('20.65');
    expect(percent[1].toFixed(3)).toBe('66.975');
    expect(percent[2].toFixed(2)).toBe('11.46');
    expect(percent[3].toFixed(2)).toBe('0.66');
    expect(percent[6].toFixed(2)).toBe('0.18');
    expect(result.stableStage.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 14);
  });

  it('reproduces the published reproductive values', () => {
    // Crouse et al. 1987, Table 5, dominant left eigenvector scaled to eggs = 1 (values recalled from
    // memory): 1, 1.40, 6.00, 116, 569, 507, 588.
    const v = result.reproductiveValue;
    expect(v[0]).toBe(1);
    expect(v[1].toFixed(2)).toBe('1.40');
    expect(v[2].toFixed(2)).toBe('6.00');
    expect(v.slice(3).map((x) => Math.round(x))).toEqual([116, 569, 507, 588]);
  });

  it('shows the paper’s management point: juvenile survival outweighs eggs and fecundity', () => {
    // Crouse et al. 1987, Fig. 3 (elasticity analysis; recalled from memory), and Caswell 2001 ch. 9:
    // λ is more elastic to survival of large juveniles than to fecundity or to egg/hatchling
    // survival — the argument for turtle excluder devices over nest protection.
    const e = result.elasticities;
    const fecundity = e[0][4] + e[0][5] + e[0][6];
    const eggSurvival = e[1][0];
    const largeJuvenileSurvival = e[2][2] + e[3][2];
    expect(largeJuvenileSurvival).toBeGreaterThan(eggSurvival);
    expect(largeJuvenileSurvival).toBeGreaterThan(fecundity);
  });

  it('agrees with mathjs eigs and a textbook power iteration', () => {
    expect(result.lambda).toBeCloseTo(mathjsPerronRoot(LOGGERHEAD), 12);
    expect(result.lambda).toBeCloseTo(powerIterationLambda(LOGGERHEAD), 12);
  });
});

describe('killer whale (Brault & Caswell 1993; Caswell 2001 Example 5.1)', () => {
  const result = analyzeMatrix(KILLER_WHALE);

  it('reproduces λ and the stable stage distribution', () => {
    // Caswell 2001 ch. 4 worked example (values recalled from memory): λ1 = 1.0254,
    // w = (0.0370, 0.3161, 0.3229, 0.3240).
    expect(result.lambda.toFixed(4)).toBe('1.0254');
    expect(result.stableStage.map((x) => x.toFixed(4))).toEqual(['0.0370', '0.3161', '0.3229', '0.3240']);
  });

  it('gives the post-reproductive class zero reproductive value and zero elasticities', () => {
    // Closed form: row/column 4 only feeds itself, so vᵀA = λvᵀ forces v4(0.9804 − λ) = 0 → v4 = 0
    // (Caswell 2001 §4.5, reproductive value of stages that cannot contribute to growth).
    expect(result.reproductiveValue[3]).toBeCloseTo(0, 12);
    expect(result.elasticities[3][3]).toBeCloseTo(0, 12);
    expect(result.elasticities[3][2]).toBeCloseTo(0, 12);
  });

  it('has damping ratio λ1 / 0.9804', () => {
    // Closed form: the matrix is block lower-triangular, so a44 = 0.9804 is an eigenvalue, and the
    // reproductive block's other roots are smaller; |λ2| = 0.9804.
    expect(result.dampingRatio).toBeCloseTo(result.lambda / 0.9804, 10);
  });

  it('scales reproductive value on the first non-zero entry when stage 0 is the dead-end class', () => {
    // Same life cycle with the post-reproductive class listed first: v for it is 0, so the scaling
    // rule moves to the yearlings; the other values must equal the unpermuted ones.
    const order = [3, 0, 1, 2];
    const permuted = order.map((i) => order.map((j) => KILLER_WHALE[i][j]));
    const p = analyzeMatrix(permuted);
    expect(p.reproductiveValue[0]).toBeCloseTo(0, 12);
    expect(p.reproductiveValue[1]).toBe(1);
    for (let k = 1; k < 4; k++) {
      expect(p.reproductiveValue[k]).toBeCloseTo(result.reproductiveValue[order[k]], 10);
    }
  });

  it('agrees with mathjs eigs and a textbook power iteration', () => {
    expect(result.lambda).toBeCloseTo(mathjsPerronRoot(KILLER_WHALE), 12);
    expect(result.lambda).toBeCloseTo(powerIterationLambda(KILLER_WHALE, 20000), 10);
  });
});

describe('teasel (Caswell 2001 Example 5.2): a weed with a seedbank', () => {
  const result = analyzeMatrix(TEASEL);

  it('agrees with mathjs eigs and a textbook power iteration', () => {
    expect(result.lambda).toBeCloseTo(mathjsPerronRoot(TEASEL), 12);
    expect(result.lambda).toBeCloseTo(powerIterationLambda(TEASEL), 12);
  });

  it('has elasticities summing to 1 with equal row and column sums per stage', () => {
    // Caswell 2001 §9.2: Σ e_ij = 1. Per stage k, Σ_i e_ik = Σ_j e_kj = v_k w_k/⟨v,w⟩ because
    // Σ_i v_i a_ik = λ v_k and Σ_j a_kj w_j = λ w_k (closed form).
    const e = result.elasticities;
    expect(e.flat().reduce((s, x) => s + x, 0)).toBeCloseTo(1, 13);
    for (let k = 0; k < e.length; k++) {
      const column = e.reduce((s, row) => s + row[k], 0);
      const row = e[k].reduce((s, x) => s + x, 0);
      expect(column).toBeCloseTo(row, 13);
    }
  });
});
