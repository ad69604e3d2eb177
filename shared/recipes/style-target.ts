/** A closed range of a target; both ends inclusive. */
export interface TargetRange {
  min: number;
  max: number;
}

/** A style of the co-op's own list: the ranges a recipe aims for. */
export interface StyleTarget {
  id: number;
  name: string;
  /** Specific gravity (20/20 °C). */
  og: TargetRange;
  fg: TargetRange;
  /** % vol. */
  abv: TargetRange;
  ibu: TargetRange;
  /** SRM. */
  colourSrm: TargetRange;
}

export type StyleTargetInput = Omit<StyleTarget, 'id'>;
