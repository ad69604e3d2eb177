import { bitternessRatio, tinsethIbu, tinsethUtilisation, totalTinsethIbu } from './bitterness';

describe('Tinseth IBU', () => {
  // Tinseth's published equation, hand-worked: 28 g at 6 % α, 60 min, 20 L, boil gravity 1.050:
  // bigness 1.65 × 0.000125^0.05 = 1.05278; time (1 − e^−2.4)/4.15 = 0.21910; U = 0.23067;
  // α added 0.06 × 28 000 mg / 20 L = 84 mg/L → 19.38 IBU.
  it('gives 19.38 IBU for the hand-worked addition', () => {
    expect(tinsethIbu({ grams: 28, alphaPercent: 6, minutes: 60 }, 1.05, 20)).toBeCloseTo(19.376, 2);
  });

  // Tinseth's published utilisation table (from memory): 0.231 at boil gravity 1.050 and 60 minutes.
  it('gives utilisation 0.231 at 1.050 and 60 minutes', () => {
    expect(tinsethUtilisation(1.05, 60)).toBeCloseTo(0.231, 3);
  });

  it('gives nothing for a flame-out addition (0 min)', () => {
    expect(tinsethIbu({ grams: 50, alphaPercent: 10, minutes: 0 }, 1.05, 20)).toBe(0);
  });

  it('adds the additions', () => {
    const a = { grams: 20, alphaPercent: 8, minutes: 60 };
    const b = { grams: 20, alphaPercent: 8, minutes: 15 };
    expect(totalTinsethIbu([a, b], 1.06, 23)).toBeCloseTo(tinsethIbu(a, 1.06, 23) + tinsethIbu(b, 1.06, 23), 12);
  });
});

describe('bitternessRatio', () => {
  it('gives BU:GU 0.8 for 40 IBU at OG 1.050 (common practice definition)', () => {
    expect(bitternessRatio(40, 1.05)).toBeCloseTo(0.8, 12);
  });
});
