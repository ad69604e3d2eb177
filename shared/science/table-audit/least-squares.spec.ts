import { leverage, solveLeastSquares } from './least-squares';

describe('solveLeastSquares', () => {
  it('recovers the line through exact points y = 2 + 3x', () => {
    const xs = [0, 1, 2, 3, 4];
    const { coefficients } = solveLeastSquares(xs.map((x) => [1, x]), xs.map((x) => 2 + 3 * x));
    expect(coefficients[0]).toBeCloseTo(2, 12);
    expect(coefficients[1]).toBeCloseTo(3, 12);
  });

  // Textbook case: fitting a constant to (1, 2, 3, 6) gives their mean, 3, and each leverage is 1/n.
  it('fits a constant as the mean, with leverage 1/n per row', () => {
    const { coefficients, r } = solveLeastSquares([[1], [1], [1], [1]], [1, 2, 3, 6]);
    expect(coefficients[0]).toBeCloseTo(3, 12);
    expect(leverage(r, [1])).toBeCloseTo(0.25, 12);
  });
});
