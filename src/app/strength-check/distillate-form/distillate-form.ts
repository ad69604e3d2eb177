import { KeyValuePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DISTILLATE_LIMITS as L, DistillateAnalysisRequest } from '@shared/strength-check';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** A lab distillate analysis of the batch: volumes, the distillate's density and temperature. */
@Component({
  selector: 'cw-distillate-form',
  imports: [ReactiveFormsModule, KeyValuePipe, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatButton],
  templateUrl: './distillate-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DistillateForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly batchId = input.required<number>();
  readonly busy = input(false);
  readonly savedCount = input(0);
  readonly error = input<string | null>(null);
  readonly fields = input<Record<string, string> | null>(null);
  readonly analysed = output<DistillateAnalysisRequest>();

  protected readonly limits = L;
  private readonly range = (r: { min: number; max: number }) => [Validators.required, Validators.min(r.min), Validators.max(r.max)];
  protected readonly form = this.fb.group({
    sampleVolumeMl: this.fb.control<number>(100, this.range(L.volumeMl)),
    madeUpVolumeMl: this.fb.control<number>(100, this.range(L.volumeMl)),
    distillateDensity: this.fb.control<number | null>(null, this.range(L.density)),
    temperatureC: this.fb.control<number>(20, this.range(L.temperature)),
    densityResolution: this.fb.control<number>(0.1, this.range(L.densityResolution)),
  });

  constructor() {
    effect(() => {
      this.savedCount();
      untracked(() => this.form.controls.distillateDensity.reset());
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form)) return;
    const v = this.form.getRawValue();
    this.analysed.emit({ batchId: this.batchId(), ...v, distillateDensity: v.distillateDensity! });
  }
}
