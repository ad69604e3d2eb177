import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { KIT_KINDS, KIT_LIMITS, KIT_STATES, KitItemInput, KitItemSummary } from '@shared/kit';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** A register entry: new when `item` is null, otherwise the item's details to change. */
export interface KitItemSave {
  kitItemId: number | null;
  input: KitItemInput;
}

export const KIT_STATE_LABELS: Record<(typeof KIT_STATES)[number], string> = { in_service: 'In service', maintenance: 'Under maintenance', retired: 'Retired' };

@Component({
  selector: 'cw-kit-item-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatSelect, MatOption, MatButton],
  templateUrl: './kit-item-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class KitItemForm {
  readonly item = input<KitItemSummary | null>(null);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly savedCount = input(0);
  readonly itemSaved = output<KitItemSave>();

  protected readonly kinds = KIT_KINDS;
  protected readonly states = KIT_STATES;
  protected readonly stateLabels = KIT_STATE_LABELS;
  protected readonly limits = KIT_LIMITS;
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    code: ['', [Validators.required, Validators.maxLength(KIT_LIMITS.codeMaxLength)]],
    name: ['', [Validators.required, Validators.maxLength(KIT_LIMITS.nameMaxLength)]],
    kind: this.fb.control<KitItemInput['kind']>('fermenter'),
    capacityLitres: this.fb.control<number | null>(null, [Validators.min(0.1), Validators.max(KIT_LIMITS.capacityMaxLitres)]),
    state: this.fb.control<KitItemInput['state']>('in_service'),
    turnaroundHours: [24, [Validators.required, Validators.min(0), Validators.max(KIT_LIMITS.turnaroundMaxHours)]],
    notes: ['', Validators.maxLength(KIT_LIMITS.notesMaxLength)],
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
    effect(() => {
      const item = this.item();
      this.savedCount();
      this.form.reset(item ? { ...item } : { code: '', name: '', kind: 'fermenter', capacityLitres: null, state: 'in_service', turnaroundHours: 24, notes: '' });
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form)) return;
    const value = this.form.getRawValue();
    this.itemSaved.emit({ kitItemId: this.item()?.id ?? null, input: { ...value, code: value.code.trim(), name: value.name.trim() } });
  }
}
