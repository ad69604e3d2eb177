import { generateMockDesign } from '@shared/recipes';
import { designToFormValue, formValueToDesign } from './recipe-form-model';

describe('recipe form model', () => {
  it('shows a metric design unchanged and reads it back exactly', () => {
    const design = generateMockDesign();

    expect(formValueToDesign(designToFormValue(design, 'metric'), 'metric')).toEqual(design);
  });

  it('shows amounts in pounds, ounces, gallons and °F for a US-unit person', () => {
    const value = designToFormValue(generateMockDesign(), 'us');

    expect([value.batchVolume, value.fermentables[0].amount, value.hops[0].amount, value.mashSteps[0].temperature]).toEqual([5.283, 9.259, 0.71, 150.8]);
  });

  it('reads US amounts back into SI within the shown precision', () => {
    const design = formValueToDesign(designToFormValue(generateMockDesign(), 'us'), 'us');

    expect(design.batchVolumeLitres).toBeCloseTo(20, 2);
    expect(design.fermentables[0].amountKg).toBeCloseTo(4.2, 3);
    expect(design.mashSteps[0].temperatureC).toBeCloseTo(66, 5);
  });
});
