import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatCard } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { DateTime } from 'luxon';
import { FermenterChoice, MoveBatchForm } from '../move-batch-form/move-batch-form';
import { LaneView } from '../view-models/timeline-view';

/** A move asked for on the lane. */
export interface LaneMove {
  batchId: number;
  brewDate: string;
  kitItemId: number;
}

/** One fermenter over the period: its utilisation and, as a list, each batch, booking and block with a bar of its phases. */
@Component({
  selector: 'cw-fermenter-lane',
  imports: [MatCard, MatIcon, MoveBatchForm],
  templateUrl: './fermenter-lane.html',
  styleUrl: './fermenter-lane.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FermenterLane {
  readonly lane = input.required<LaneView>();
  readonly mayPlan = input(false);
  /** Where a planned batch may be moved to. */
  readonly fermenters = input<FermenterChoice[]>([]);
  readonly today = input.required<DateTime>();
  readonly movingBatchId = input<number | null>(null);
  readonly moveError = input<{ batchId: number; message: string } | null>(null);
  readonly moveSubmitted = output<LaneMove>();
}
