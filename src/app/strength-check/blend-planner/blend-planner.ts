import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, signal } from '@angular/core';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { BlendMode, blendPlanOrReason } from './blend-plan';

/** Plans a mix, a dilution or a blend to a target % vol, showing what the mixture loses to contraction. */
@Component({
  selector: 'cw-blend-planner',
  imports: [DecimalPipe, MatButtonToggleGroup, MatButtonToggle, MatFormField, MatLabel, MatSuffix, MatInput],
  templateUrl: './blend-planner.html',
  styleUrl: './blend-planner.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlendPlanner {
  protected readonly mode = signal<BlendMode>('mix');
  protected readonly first = signal<number | null>(40);
  protected readonly second = signal<number | null>(60);
  protected readonly target = signal<number | null>(20);
  protected readonly addition = signal<number | null>(0);
  protected readonly temperature = signal<number | null>(20);
  protected readonly plan = computed(() => blendPlanOrReason({
    mode: this.mode(), first: this.first(), second: this.second(), target: this.target(), addition: this.addition(), temperature: this.temperature(),
  }));
  protected readonly result = computed(() => { const p = this.plan(); return typeof p === 'string' ? null : p; });
  protected readonly reason = computed(() => { const p = this.plan(); return typeof p === 'string' ? p : null; });

  protected changeMode(mode: BlendMode): void {
    this.mode.set(mode);
    if (mode === 'mix') { this.first.set(40); this.second.set(60); } else { this.first.set(1); this.second.set(40); }
  }

  protected readNumber(target: EventTarget | null): number | null {
    const text = (target as HTMLInputElement).value;
    return text.trim() === '' ? null : Number(text);
  }
}
