import { TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { BATCH_STATUSES, BatchStatusDates } from '@shared/batches';
import { ChosenMove, StatusFlow } from './status-flow';

const noDates = Object.fromEntries(BATCH_STATUSES.map((s) => [s, null])) as BatchStatusDates;

describe('StatusFlow', () => {
  async function render() {
    TestBed.configureTestingModule({ imports: [StatusFlow], providers: [provideCoopDateAdapter()] });
    const fixture = TestBed.createComponent(StatusFlow);
    fixture.componentRef.setInput('status', 'planned');
    fixture.componentRef.setInput('dates', noDates);
    fixture.componentRef.setInput('editable', true);
    fixture.componentRef.setInput('coopTimeZone', 'Europe/Berlin');
    await fixture.whenStable();
    const moves: ChosenMove[] = [];
    fixture.componentInstance.moveChosen.subscribe((move) => moves.push(move));
    return { fixture, element: fixture.nativeElement as HTMLElement, moves };
  }

  it('moves for now unless told it happened earlier', async () => {
    const { element, moves } = await render();
    element.querySelector<HTMLButtonElement>('.moves button')!.click();
    expect(moves).toEqual([{ status: 'brewing', at: null }]);
  });

  it('records a back-dated move at the date (yyyy-MM-dd) and 24-hour time typed on the co-op clocks', async () => {
    const { fixture, element, moves } = await render();
    element.querySelector<HTMLInputElement>('mat-checkbox input')!.click();
    await fixture.whenStable();
    const date = element.querySelector<HTMLInputElement>('.when input[formcontrolname="date"]')!;
    date.value = '2026-11-20';
    date.dispatchEvent(new Event('input'));
    const time = element.querySelector<HTMLInputElement>('.when input[formcontrolname="time"]')!;
    time.value = '08:30';
    time.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    element.querySelector<HTMLButtonElement>('.moves button')!.click();
    // 08:30 in Berlin on 20 Nov 2026 is 07:30 UTC (UTC+1 in winter).
    expect(moves).toEqual([{ status: 'brewing', at: '2026-11-20T07:30:00.000Z' }]);
  });
});
