import { TestBed } from '@angular/core/testing';
import { provideCoopDateAdapter } from '@app/ui/coop-date-formats';
import { Batch, UpdateBatchRequest } from '@shared/batches';
import { BatchDetailsForm } from './batch-details-form';

const batch = {
  id: 5, name: 'Test batch', brewerId: 1, brewerName: 'Test brewer', brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: null, notes: '',
} as Batch;

describe('BatchDetailsForm', () => {
  it('sends only the fields that changed', async () => {
    TestBed.configureTestingModule({ imports: [BatchDetailsForm], providers: [provideCoopDateAdapter()] });
    const fixture = TestBed.createComponent(BatchDetailsForm);
    fixture.componentRef.setInput('batch', batch);
    fixture.componentRef.setInput('brewers', [{ id: 1, name: 'Test brewer' }, { id: 2, name: 'Other brewer' }]);
    fixture.componentRef.setInput('fermenters', []);
    fixture.componentRef.setInput('coopTimeZone', 'UTC');
    await fixture.whenStable();
    const sent: UpdateBatchRequest[] = [];
    fixture.componentInstance.saved.subscribe((changes) => sent.push(changes));
    const element = fixture.nativeElement as HTMLElement;
    const volume = element.querySelector<HTMLInputElement>('input[formcontrolname="plannedVolumeLitres"]')!;
    volume.value = '23';
    volume.dispatchEvent(new Event('input'));
    element.querySelector('form')!.dispatchEvent(new Event('submit'));
    expect(sent).toEqual([{ plannedVolumeLitres: 23 }]);
  });
});
