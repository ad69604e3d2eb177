import { swatchColour } from './swatch-colour';

describe('swatchColour', () => {
  it('shows the palest anchor for anything paler than 2 SRM', () => {
    expect(swatchColour(0.5)).toBe(swatchColour(2));
  });

  it('lies between its two anchors halfway along', () => {
    expect(swatchColour(9)).toBe('rgb(210, 150, 47)');
  });

  it('darkens as the colour rises', () => {
    const brightness = (css: string) => css.match(/\d+/g)!.map(Number).reduce((a, b) => a + b, 0);

    expect(brightness(swatchColour(35))).toBeLessThan(brightness(swatchColour(8)));
  });
});
