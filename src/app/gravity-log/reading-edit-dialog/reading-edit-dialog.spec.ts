import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { GravityReading } from '@shared/readings';
import { ReadingEditDialog } from './reading-edit-dialog';

const reading = { id: 7, instrument: 'hydrometer', rawValue: 1.05, rawUnit: 'sg', sampleTemperatureC: 20, calibrationTemperatureC: 20, note: '' } as GravityReading;

describe('ReadingEditDialog', () => {
  async function render() {
    const close = jest.fn();
    TestBed.configureTestingModule({ imports: [ReadingEditDialog], providers: [{ provide: MAT_DIALOG_DATA, useValue: reading }, { provide: MatDialogRef, useValue: { close } }] });
    const fixture = TestBed.createComponent(ReadingEditDialog);
    await fixture.whenStable();
    return { element: fixture.nativeElement as HTMLElement, close };
  }

  it('shows the value as read without a field to change it, and closes with only the corrected fields', async () => {
    const { element, close } = await render();
    expect(element.textContent).toContain('1.05');
    expect(element.querySelector('input[formcontrolname="rawValue"]')).toBeNull();
    const temperature = element.querySelector<HTMLInputElement>('input[formcontrolname="sampleTemperatureC"]')!;
    temperature.value = '24';
    temperature.dispatchEvent(new Event('input'));
    element.querySelector('form')!.dispatchEvent(new Event('submit'));
    expect(close).toHaveBeenCalledWith({ sampleTemperatureC: 24 });
  });

  it('sends nothing when nothing changed', async () => {
    const { element, close } = await render();
    element.querySelector('form')!.dispatchEvent(new Event('submit'));
    expect(close).toHaveBeenCalledWith(null);
  });
});
