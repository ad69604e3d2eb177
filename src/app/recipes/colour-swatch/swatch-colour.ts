/** Shades picked by eye for this app, from pale straw to near black, at SRM anchor points. */
const ANCHORS: readonly [srm: number, rgb: readonly [number, number, number]][] = [
  [2, [243, 220, 116]],
  [6, [224, 177, 58]],
  [12, [196, 122, 36]],
  [20, [143, 74, 28]],
  [30, [78, 38, 20]],
  [40, [28, 13, 7]],
];

/** An on-screen shade for a colour in SRM: a plain interpolation, a hint and not a measurement. */
export function swatchColour(srm: number): string {
  const clamped = Math.min(Math.max(srm, ANCHORS[0][0]), ANCHORS[ANCHORS.length - 1][0]);
  const upper = ANCHORS.findIndex(([anchor]) => anchor >= clamped);
  const [highSrm, high] = ANCHORS[upper];
  const [lowSrm, low] = ANCHORS[Math.max(upper - 1, 0)];
  const t = highSrm === lowSrm ? 0 : (clamped - lowSrm) / (highSrm - lowSrm);
  const channel = (i: number) => Math.round(low[i] + (high[i] - low[i]) * t);
  return `rgb(${channel(0)}, ${channel(1)}, ${channel(2)})`;
}
