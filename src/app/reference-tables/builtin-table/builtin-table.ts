import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, signal } from '@angular/core';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { builtinDensityTable } from '@shared/reference-tables';

/** The built-in OIML R 22 equation printed as a table at a temperature of the person's choice. */
@Component({
  selector: 'cw-builtin-table',
  imports: [DecimalPipe, MatFormField, MatLabel, MatSuffix, MatInput, MatSelect, MatOption],
  templateUrl: './builtin-table.html',
  styleUrl: './builtin-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BuiltinTable {
  protected readonly temperature = signal(20);
  protected readonly step = signal(5);
  protected readonly rows = computed(() => {
    const t = this.temperature();
    return Number.isFinite(t) && t >= 0 && t <= 40 ? builtinDensityTable(t, this.step()) : [];
  });

  protected setTemperature(target: EventTarget | null): void {
    const text = (target as HTMLInputElement).value;
    this.temperature.set(text.trim() === '' ? Number.NaN : Number(text));
  }
}
