import { StyleTarget, TargetRange } from './style-target';

/** The five figures a style sets ranges for. */
export const STYLE_TARGET_KEYS = ['og', 'fg', 'abv', 'ibu', 'colourSrm'] as const;
export type StyleTargetKey = (typeof STYLE_TARGET_KEYS)[number];

export type TargetPosition = 'below' | 'within' | 'above';

/** One predicted figure set against its range. */
export interface StyleTargetComparison {
  key: StyleTargetKey;
  label: string;
  unit: string;
  /** Null while the figure cannot be predicted (no fermentables, no yeast). */
  value: number | null;
  range: TargetRange;
  position: TargetPosition | null;
}

/** The predicted figures a comparison reads. */
export type ComparedFigures = Record<StyleTargetKey, number | null>;

const LABELS: Record<StyleTargetKey, { label: string; unit: string }> = {
  og: { label: 'OG', unit: 'SG' },
  fg: { label: 'FG', unit: 'SG' },
  abv: { label: 'ABV', unit: '% vol' },
  ibu: { label: 'IBU', unit: 'IBU' },
  colourSrm: { label: 'Colour', unit: 'SRM' },
};

/** Where a value falls in a closed range. */
export function targetPosition(value: number, range: TargetRange): TargetPosition {
  if (value < range.min) return 'below';
  return value > range.max ? 'above' : 'within';
}

/** Each predicted figure with the style's range and whether it is below, within or above it. */
export function compareFiguresToStyle(figures: ComparedFigures, style: StyleTarget): StyleTargetComparison[] {
  return STYLE_TARGET_KEYS.map((key) => {
    const value = figures[key];
    return { key, ...LABELS[key], value, range: style[key], position: value === null ? null : targetPosition(value, style[key]) };
  });
}
