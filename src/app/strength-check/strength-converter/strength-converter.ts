import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, signal } from '@angular/core';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { CONVERTER_TEMPERATURE, STRENGTH_QUANTITIES, STRENGTH_QUANTITY_LIMITS, StrengthQuantity } from '@shared/strength-check';
import { conversionOrReason } from './conversion-or-reason';

/** One strength stated every way at once: % vol, % mass, mole fraction, volume fraction before mixing, density, g/L. */
@Component({
  selector: 'cw-strength-converter',
  imports: [DecimalPipe, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption],
  templateUrl: './strength-converter.html',
  styleUrl: './strength-converter.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthConverter {
  protected readonly quantities = STRENGTH_QUANTITIES;
  protected readonly limits = STRENGTH_QUANTITY_LIMITS;
  protected readonly temperatureLimits = CONVERTER_TEMPERATURE;
  protected readonly quantity = signal<StrengthQuantity>('percentVolume20');
  protected readonly value = signal<number | null>(40);
  protected readonly temperature = signal<number | null>(20);
  protected readonly outcome = computed(() => conversionOrReason(this.quantity(), this.value(), this.temperature()));

  protected readNumber(target: EventTarget | null): number | null {
    const text = (target as HTMLInputElement).value;
    return text.trim() === '' ? null : Number(text);
  }
}
