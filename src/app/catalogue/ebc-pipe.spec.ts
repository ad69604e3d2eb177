import { ebcFromLovibond } from '@shared/science';
import { EbcPipe } from './ebc-pipe';

describe('EbcPipe', () => {
  const pipe = new EbcPipe();

  it('when given a colour in °L, then it shows the rounded EBC figure of the science library', () => {
    expect(pipe.transform(60)).toBe(`≈ ${Math.round(ebcFromLovibond(60))} EBC`);
  });

  it('when the field is empty or out of range, then it shows nothing', () => {
    expect(pipe.transform(null)).toBe('');
    expect(pipe.transform(-1)).toBe('');
    expect(pipe.transform(9999)).toBe('');
  });
});
