import { ComponentFixture, TestBed } from '@angular/core/testing';
import { generateMockCatalogue, generateMockDesign, RecipeDesign } from '@shared/recipes';
import { RecipeForm } from './recipe-form';

/** JSON with the keys in one order, so two designs compare byte for byte whatever order their fields were set in. */
function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, each) =>
    each && typeof each === 'object' && !Array.isArray(each) ? Object.fromEntries(Object.entries(each).sort(([a], [b]) => a.localeCompare(b))) : each,
  );
}

// Each test mounts the whole form with its Material fields, which takes a few seconds on a busy machine.
jest.setTimeout(20_000);

describe('RecipeForm', () => {
  let fixture: ComponentFixture<RecipeForm>;
  let element: HTMLElement;
  let saved: RecipeDesign[];

  const input = (name: string) => element.querySelector<HTMLInputElement>(`input[formcontrolname="${name}"]`)!;
  const saveButton = () => [...element.querySelectorAll('button')].find((b) => b.textContent?.includes('Save'))!;

  async function type(field: HTMLInputElement, value: string): Promise<void> {
    field.value = value;
    field.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  async function mount(design: RecipeDesign): Promise<void> {
    TestBed.configureTestingModule({ imports: [RecipeForm] });
    fixture = TestBed.createComponent(RecipeForm);
    fixture.componentRef.setInput('design', design);
    fixture.componentRef.setInput('catalogue', generateMockCatalogue());
    element = fixture.nativeElement as HTMLElement;
    saved = [];
    fixture.componentInstance.saveSubmitted.subscribe((each) => saved.push(each));
    await fixture.whenStable();
  }

  it('saves the design byte for byte after the units are switched ten times while editing', async () => {
    const design = generateMockDesign({
      batchVolumeLitres: 23,
      fermentables: [{ fermentableId: 1, amountKg: 5 }, { fermentableId: 2, amountKg: 0.37 }],
      hops: [{ hopId: 11, amountGrams: 30, time: 60, use: 'boil' }, { hopId: 12, amountGrams: 17.3, time: 10, use: 'boil' }],
      mashSteps: [{ name: 'Saccharification rest', temperatureC: 66.5, minutes: 60 }],
    });
    await mount(design);
    await type(input('name'), design.name);

    for (let toggle = 0; toggle < 10; toggle++) {
      fixture.componentRef.setInput('unitSystem', toggle % 2 === 0 ? 'us' : 'metric');
      await fixture.whenStable();
    }
    saveButton().click();
    await fixture.whenStable();

    expect(canonicalJson(saved[0])).toBe(canonicalJson(design));
  });

  it('takes what the person typed in US units, converted once', async () => {
    await mount(generateMockDesign());
    fixture.componentRef.setInput('unitSystem', 'us');
    await fixture.whenStable();

    await type(input('batchVolume'), '5');
    saveButton().click();
    await fixture.whenStable();

    expect(saved[0].batchVolumeLitres).toBeCloseTo(18.927, 3); // 5 US gal × 3.785411784 L (NIST Handbook 44)
  });

  it('marks a boil addition longer than the boil as a field error and does not save', async () => {
    await mount(generateMockDesign({ boilMinutes: 60 }));
    const time = element.querySelectorAll<HTMLInputElement>('input[formcontrolname="time"]')[0];

    await type(time, '75');
    saveButton().click();
    await fixture.whenStable();

    expect(element.textContent).toContain('At most the boil time.');
    expect(saved).toEqual([]);
  });
});
