import { Pipe, PipeTransform } from '@angular/core';
import { ebcFromLovibond } from '@shared/science';

/** A malt colour in °L restated in EBC, rounded, for hints beside a °L field; empty when not a colour. */
@Pipe({ name: 'cwEbc' })
export class EbcPipe implements PipeTransform {
  transform(lovibond: number | null | undefined): string {
    if (lovibond === null || lovibond === undefined || !Number.isFinite(lovibond) || lovibond < 0 || lovibond > 700) return '';
    return `≈ ${Math.round(ebcFromLovibond(lovibond))} EBC`;
  }
}
