import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DECLARED_STRENGTH_LIMITS as L, DeclaredStrengthVerdict, SignOffRequest, ToleranceClass } from '@shared/strength-check';

const VERDICT_WORDS = { within: 'Within the tolerance', outside: 'Outside the tolerance', undecided: 'Undecided: too close to the edge for the measurement\'s uncertainty' } as const;

/** A declared strength and its product class: check it against the tolerance, and (brewers) sign it off. */
@Component({
  selector: 'cw-declared-strength-form',
  imports: [MatFormField, MatLabel, MatSuffix, MatInput, MatSelect, MatOption, MatButton],
  templateUrl: './declared-strength-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeclaredStrengthForm {
  readonly classes = input.required<ToleranceClass[]>();
  readonly verdict = input<DeclaredStrengthVerdict | null>(null);
  readonly canSignOff = input(false);
  readonly busy = input(false);
  readonly checked = output<SignOffRequest>();
  readonly signOffRequested = output<SignOffRequest>();

  protected readonly limits = L;
  protected readonly words = VERDICT_WORDS;
  protected readonly declared = signal<number | null>(null);
  protected readonly classId = signal<number | null>(null);

  protected request(): SignOffRequest | null {
    const declared = this.declared();
    const toleranceClassId = this.classId();
    if (declared === null || toleranceClassId === null || !(declared >= L.min && declared <= L.max)) return null;
    return { declaredPercentVolume: declared, toleranceClassId };
  }

  protected readNumber(target: EventTarget | null): number | null {
    const text = (target as HTMLInputElement).value;
    return text.trim() === '' ? null : Number(text);
  }

  protected check(): void {
    const request = this.request();
    if (request) this.checked.emit(request);
  }

  protected signOff(): void {
    const request = this.request();
    if (request) this.signOffRequested.emit(request);
  }
}
