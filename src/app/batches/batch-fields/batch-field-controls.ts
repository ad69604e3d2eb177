import { NonNullableFormBuilder, Validators } from '@angular/forms';
import { DateTime } from 'luxon';
import { BATCH_LIMITS } from '@shared/batches';

/** The controls a batch is started and edited with, held to the shared batch limits. */
export function batchFieldControls(fb: NonNullableFormBuilder, brewDate: DateTime | null) {
  return {
    name: fb.control('', [Validators.required, Validators.maxLength(BATCH_LIMITS.nameMaxLength)]),
    brewDate: fb.control<DateTime | null>(brewDate, Validators.required),
    plannedVolumeLitres: fb.control(20, [Validators.required, Validators.min(BATCH_LIMITS.volumeLitres.min), Validators.max(BATCH_LIMITS.volumeLitres.max)]),
    fermenterId: fb.control<number | null>(null),
    notes: fb.control('', Validators.maxLength(BATCH_LIMITS.notesMaxLength)),
  };
}

export type BatchFieldControls = ReturnType<typeof batchFieldControls>;
