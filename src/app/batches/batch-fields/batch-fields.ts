import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { ControlContainer, ReactiveFormsModule } from '@angular/forms';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { BATCH_LIMITS, FermenterChoice } from '@shared/batches';
import { BatchFieldControls } from './batch-field-controls';

/**
 * The fields a batch is started and edited with: name, brew day, planned volume, fermenter and notes,
 * bound to the enclosing form's group; what goes between the name and the rest is projected.
 */
@Component({
  selector: 'cw-batch-fields',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatInput, MatError, MatHint, MatSuffix, MatSelect, MatOption, MatDatepicker, MatDatepickerInput, MatDatepickerToggle],
  templateUrl: './batch-fields.html',
  // Its fields stand in the enclosing form's column as if written there.
  styles: ':host { display: contents; }',
  // The fields join the form group of the component that holds them.
  viewProviders: [{ provide: ControlContainer, useFactory: () => inject(ControlContainer, { skipSelf: true }) }],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchFields {
  readonly controls = input.required<BatchFieldControls>();
  readonly fermenters = input.required<readonly FermenterChoice[]>();
  readonly coopTimeZone = input.required<string>();
  /** The batch being edited, whose own fermenter is not "in use"; null while starting one. */
  readonly batchId = input<number | null>(null);

  protected readonly limits = BATCH_LIMITS;
}
