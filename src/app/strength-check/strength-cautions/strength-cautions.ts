import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIcon } from '@angular/material/icon';

/** The cautions beside every strength figure: labelling law decides, and distillation is a matter of licence. */
@Component({
  selector: 'cw-strength-cautions',
  imports: [MatIcon],
  template: `
    <aside class="cautions" aria-label="Cautions">
      <p><mat-icon aria-hidden="true">gavel</mat-icon>
        <span><strong>Declared strength:</strong> what a label must state, and the tolerance it is held to, are set by local law for labels and excise.
        These figures are an aid; the brewer and the local authority decide.</span></p>
      <p><mat-icon aria-hidden="true">warning</mat-icon>
        <span><strong>Distillation:</strong> distilling alcohol at home is illegal in many places. Blending figures are for mixing spirits you may lawfully hold,
        and a lab distillate analysis is for a sample distilled under a method and licence that permit it.</span></p>
    </aside>
  `,
  styles: `
    .cautions { border-left: 4px solid var(--cw-copper); padding: 4px 12px; margin: 16px 0; background: var(--mat-sys-surface-container-low); }
    p { display: flex; gap: 8px; align-items: flex-start; max-width: 80ch; }
    mat-icon { color: var(--cw-copper-text); flex: none; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthCautions {}
