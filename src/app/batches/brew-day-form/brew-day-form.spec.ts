import { TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { BatchPrediction, BrewDayMeasurements } from '@shared/batches';
import { BrewDayForm } from './brew-day-form';

const measured: BrewDayMeasurements = { preBoilLitres: null, preBoilGravity: null, fermenterLitres: null, originalGravity: null, originalGravityTemperatureC: null, pitchedAt: null };
// Invented figures of a version designed for 23 L.
const predicted: BatchPrediction = { og: 1.051, fg: 1.012, abvEstimate: 5.1, preBoilLitres: 29.5, preBoilGravity: 1.044, batchVolumeLitres: 23, yeastAttenuationPercent: 76 };

describe('BrewDayForm', () => {
  async function render(plannedLitres: number) {
    TestBed.configureTestingModule({ providers: [provideCoopDateAdapter()] });
    const fixture = TestBed.createComponent(BrewDayForm);
    fixture.componentRef.setInput('measured', measured);
    fixture.componentRef.setInput('predicted', predicted);
    fixture.componentRef.setInput('plannedLitres', plannedLitres);
    fixture.componentRef.setInput('coopTimeZone', 'Europe/Berlin');
    await fixture.whenStable();
    return [...(fixture.nativeElement as HTMLElement).querySelectorAll('.predicted')].map((p) => p.textContent!.trim());
  }

  it("sets the batch's own planned volume beside the volume into the fermenter, and says which volume the pre-boil prediction is for", async () => {
    const figures = await render(20);

    expect(figures).toContain('Planned 20.0 L');
    expect(figures).toContain("Predicted 29.5 L for the recipe's 23.0 L");
  });

  it('adds nothing when the batch is planned at the recipe’s volume', async () => {
    const figures = await render(23);

    expect(figures).toContain('Planned 23.0 L');
    expect(figures).toContain('Predicted 29.5 L');
  });
});
