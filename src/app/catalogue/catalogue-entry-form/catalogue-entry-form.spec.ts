import { ComponentFixture, TestBed } from '@angular/core/testing';
import { ebcFromLovibond } from '@shared/science';
import { CatalogueEntryInput } from '../catalogue-entry';
import { CatalogueEntryForm } from './catalogue-entry-form';

describe('CatalogueEntryForm', () => {
  let fixture: ComponentFixture<CatalogueEntryForm>;
  let element: HTMLElement;
  const submitted: CatalogueEntryInput[] = [];

  beforeEach(async () => {
    submitted.length = 0;
    fixture = TestBed.createComponent(CatalogueEntryForm);
    fixture.componentRef.setInput('kind', 'fermentables');
    fixture.componentInstance.submitted.subscribe((input) => submitted.push(input));
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  const formFields = () => [...element.querySelectorAll('mat-form-field')];
  const labels = () => formFields().map((f) => f.querySelector('mat-label')?.textContent?.trim());
  const fieldOf = (label: string) => formFields().find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!;
  const type = (label: string, value: string) => {
    const input = fieldOf(label).querySelector('input') as HTMLInputElement;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  };
  const submit = async () => {
    (element.querySelector('button[type="submit"]') as HTMLButtonElement).click();
    await fixture.whenStable();
  };
  const alerts = () => [...element.querySelectorAll('[role="alert"]')].map((a) => a.textContent?.trim());

  it('asks for a fermentable’s kind, extract, colour (with its EBC) and usual maximum share, and sends them', async () => {
    expect(labels()).toEqual(['Name', 'Kind', 'Extract potential', 'Colour', 'Usual maximum share']);
    type('Name', '  Test pale malt ');
    type('Extract potential', '80');
    type('Colour', '3');
    await fixture.whenStable();
    expect(fieldOf('Colour').querySelector('mat-hint')?.textContent?.trim()).toBe(`≈ ${Math.round(ebcFromLovibond(3))} EBC`);

    await submit();

    expect(submitted).toEqual([{ name: 'Test pale malt', kind: 'grain', extractPercent: 80, colourLovibond: 3, maxSharePercent: null }]);
  });

  it('sends nothing while a field is out of range or the name is missing, and names what is wrong', async () => {
    type('Extract potential', '120');
    type('Colour', '3');

    await submit();

    expect(submitted).toEqual([]);
    const errors = [...element.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
    expect(errors).toEqual(['Enter a name (up to 100 characters).', 'From 0 to 100 %.']);
  });

  it('when the kind changes to yeasts, then it shows the yeast fields and refuses a range whose ends are swapped', async () => {
    fixture.componentRef.setInput('kind', 'yeasts');
    await fixture.whenStable();
    expect(labels()).toEqual(['Name', 'Attenuation from', 'Attenuation to', 'Temperature from', 'Temperature to', 'Flocculation']);
    type('Name', 'Test ale yeast');
    type('Attenuation from', '80');
    type('Attenuation to', '72');
    type('Temperature from', '16');
    type('Temperature to', '22');

    await submit();

    expect(submitted).toEqual([]);
    expect(alerts()).toEqual(['The attenuation range runs from the lower to the higher figure.']);
    type('Attenuation to', '84');
    await submit();
    expect(submitted).toEqual([
      { name: 'Test ale yeast', attenuationMinPercent: 80, attenuationMaxPercent: 84, temperatureMinC: 16, temperatureMaxC: 22, flocculation: 'medium' },
    ]);
  });

  it('when the kind changes to hops, then the hop fields are bound to the hop entry', async () => {
    fixture.componentRef.setInput('kind', 'hops');
    await fixture.whenStable();
    expect(labels()).toEqual(['Name', 'Alpha acids', 'Form']);
    type('Name', 'Test hop');
    type('Alpha acids', '7.5');

    await submit();

    expect(submitted).toEqual([{ name: 'Test hop', alphaAcidPercent: 7.5, form: 'pellet' }]);
  });
});
