import { TestBed } from '@angular/core/testing';
import { FormGroup } from '@angular/forms';
import { DateTime } from 'luxon';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { PlanBatchForm, PlanRequest } from './plan-batch-form';

describe('PlanBatchForm', () => {
  async function render(brewers: { id: number; name: string }[] | null) {
    TestBed.configureTestingModule({ imports: [PlanBatchForm], providers: [provideCoopDateAdapter()] });
    const fixture = TestBed.createComponent(PlanBatchForm);
    fixture.componentRef.setInput('recipes', [{ id: 4, name: 'Hedge pale', version: 2 }]);
    fixture.componentRef.setInput('today', DateTime.fromISO('2027-01-04'));
    fixture.componentRef.setInput('brewers', brewers);
    await fixture.whenStable();
    const asked: PlanRequest[] = [];
    fixture.componentInstance.proposalsRequested.subscribe((plan) => asked.push(plan));
    const form = (fixture.componentInstance as unknown as { form: FormGroup }).form;
    form.patchValue({ name: 'For Tova', recipeId: 4, volumeLitres: 20, wantedWeek: DateTime.fromISO('2027-01-13') });
    await fixture.whenStable();
    const element = fixture.nativeElement as HTMLElement;
    const submit = () => element.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    return { element, form, asked, submit };
  }

  it('offers an admin the active brewers and asks for the one chosen', async () => {
    const { element, form, asked, submit } = await render([{ id: 21, name: 'Tova Brewer' }]);
    form.patchValue({ brewerId: 21 });
    submit();

    expect([...element.querySelectorAll('mat-label')].map((l) => l.textContent?.trim())).toContain('Brewer');
    expect(asked).toEqual([{ name: 'For Tova', brewerId: 21, request: { recipeId: 4, recipeVersion: 2, volumeLitres: 20, wantedWeek: '2027-01-13' } }]);
  });

  it('plans for the brewer themself when no choice is offered', async () => {
    const { element, asked, submit } = await render(null);
    submit();

    expect([...element.querySelectorAll('mat-label')].map((l) => l.textContent?.trim())).not.toContain('Brewer');
    expect(asked).toEqual([{ name: 'For Tova', brewerId: null, request: { recipeId: 4, recipeVersion: 2, volumeLitres: 20, wantedWeek: '2027-01-13' } }]);
  });
});
