import { isBackwardMove, nextStatus, skippedStatuses } from './batch-status';

describe('batch status flow', () => {
  it('when moving one step, then nothing is skipped', () => {
    expect(skippedStatuses('planned', 'brewing')).toEqual([]);
  });

  it('when moving from planned to conditioning, then brewing and fermenting are skipped', () => {
    expect(skippedStatuses('planned', 'conditioning')).toEqual(['brewing', 'fermenting']);
  });

  it('when asking for the next status, then it follows the flow and ends at archived', () => {
    expect(nextStatus('fermenting')).toBe('conditioning');
    expect(nextStatus('archived')).toBeNull();
  });

  it('when moving to the same or an earlier status, then it is a backward move', () => {
    expect(isBackwardMove('fermenting', 'brewing')).toBe(true);
    expect(isBackwardMove('fermenting', 'fermenting')).toBe(true);
    expect(isBackwardMove('fermenting', 'packaged')).toBe(false);
  });
});
