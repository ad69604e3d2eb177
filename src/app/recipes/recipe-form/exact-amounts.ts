import { AbstractControl } from '@angular/forms';

/**
 * The stored (SI) value behind each converted field. A field shows a rounded conversion; while it still
 * shows that, the design takes the stored value back exactly, so switching units never moves a figure.
 */
export class ExactAmounts {
  private readonly given = new WeakMap<AbstractControl, { shown: number | null; si: number }>();

  /** Notes the stored value a field was given and what it shows for it. */
  remember(control: AbstractControl<number | null>, si: number): void {
    this.given.set(control, { shown: control.value, si });
  }

  /** The stored value while the field is untouched, else the converted typed value. */
  si(control: AbstractControl<number | null>, converted: number): number {
    const given = this.given.get(control);
    return given && given.shown === control.value ? given.si : converted;
  }
}
