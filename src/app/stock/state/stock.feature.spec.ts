import { StockLot } from '@shared/stock';
import { StockApiActions } from './stock-api.actions';
import { initialStockState, stockFeature } from './stock.feature';
import { filterLots } from './stock.selectors';

const lot = (id: number, ingredientName: string, supplierNote = ''): StockLot => ({
  id, ingredientId: id, ingredientKind: 'fermentables', ingredientName, unit: 'kg', receivedQuantity: 1, onHand: 1, receivedOn: '2026-10-01', bestBefore: null, supplierNote, createdAt: '2026-10-01T08:00:00Z',
});

describe('stock feature', () => {
  const { reducer } = stockFeature;

  it('puts a saved lot in place of the old one, or first when new', () => {
    const loaded = reducer(initialStockState, StockApiActions.lotsLoadedSuccess({ lots: [lot(1, 'Malt'), lot(2, 'Oats')] }));
    const adjusted = reducer(loaded, StockApiActions.lotSavedSuccess({ lot: { ...lot(2, 'Oats'), onHand: 0.5 }, message: '' }));
    const received = reducer(adjusted, StockApiActions.lotSavedSuccess({ lot: lot(3, 'Rye'), message: '' }));

    expect(received.lots!.map((l) => [l.id, l.onHand])).toEqual([[3, 1], [1, 1], [2, 0.5]]);
  });

  it('keeps the fresh preview beside the refusal when a draw is refused', () => {
    const preview = { batchId: 4, batchName: 'Test', blockedReason: null, lines: [], drawn: null };
    const state = reducer({ ...initialStockState, drawSaving: true }, StockApiActions.drawMadeFailure({ message: 'Stock is short of malt.', preview }));

    expect(state).toMatchObject({ drawSaving: false, drawError: 'Stock is short of malt.', drawPreview: preview });
  });

  it('filters lots by ingredient or supplier note, in any case', () => {
    const lots = [lot(1, 'Pale malt', 'Hollow Lane'), lot(2, 'Flaked oats')];

    expect(filterLots(lots, 'OATS').map((l) => l.id)).toEqual([2]);
    expect(filterLots(lots, 'hollow').map((l) => l.id)).toEqual([1]);
    expect(filterLots(lots, '  ')).toHaveLength(2);
  });
});
