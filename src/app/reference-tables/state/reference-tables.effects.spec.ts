import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, of, throwError } from 'rxjs';
import { ReferenceTablesClient } from '../reference-tables-client';
import { ReferenceTablePageActions } from './reference-table-page.actions';
import { ReferenceTablesApiActions } from './reference-tables-api.actions';
import { ReferenceTablesPageActions } from './reference-tables-page.actions';
import { chooseLabTable, correctRow, uploadTable } from './reference-tables.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const upload = { name: 'Handbook 20 °C', resolution: 0.01, fileName: 'table.csv', csv: 'massPercent,density,temperature\n' };

describe('reference tables effects', () => {
  it('uploadTable keeps the server reasons per line when a file is refused', async () => {
    const error = new HttpErrorResponse({ status: 400, error: { error: { code: 'table-rejected', message: 'The table was not stored: 1 line(s) need fixing.' }, fields: { 'line 4': 'density "lots" must be a number' } } });
    const client = { upload: jest.fn(() => throwError(() => error)) } as unknown as ReferenceTablesClient;

    const action = await firstValueFrom(uploadTable(actionsOf(ReferenceTablesPageActions.uploadSubmitted({ upload })), client));

    expect(client.upload).toHaveBeenCalledWith(upload);
    expect(action).toEqual(ReferenceTablesApiActions.tableUploadedFailure({ message: 'The table was not stored: 1 line(s) need fixing.', fields: { 'line 4': 'density "lots" must be a number' } }));
  });

  it('correctRow sends the correction of one row and takes the re-run audit', async () => {
    const table = { id: 2 } as never;
    const client = { correct: jest.fn(() => of(table)) } as unknown as ReferenceTablesClient;
    const correction = { density: 930.12, note: 'typo' };

    const action = await firstValueFrom(correctRow(actionsOf(ReferenceTablePageActions.rowCorrected({ tableId: 2, rowId: 9, correction })), client));

    expect(client.correct).toHaveBeenCalledWith(2, 9, correction);
    expect(action).toEqual(ReferenceTablesApiActions.rowCorrectedSuccess({ table }));
  });

  it('chooseLabTable sends null for the built-in equation', async () => {
    const list = { tables: [], labTableId: null };
    const client = { chooseLabTable: jest.fn(() => of(list)) } as unknown as ReferenceTablesClient;

    const action = await firstValueFrom(chooseLabTable(actionsOf(ReferenceTablesPageActions.labTableChosen({ tableId: null })), client));

    expect(client.chooseLabTable).toHaveBeenCalledWith(null);
    expect(action).toEqual(ReferenceTablesApiActions.labTableChosenSuccess({ list }));
  });
});
