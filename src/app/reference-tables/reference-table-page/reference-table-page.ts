import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { AuditedRows, RowCorrection } from '../audited-rows/audited-rows';
import { ExcessVolumeChart } from '../excess-volume-chart/excess-volume-chart';
import { ReferenceTablePageActions } from '../state/reference-table-page.actions';
import { selectReferenceTablePageViewModel } from '../state/reference-tables.selectors';

/** One uploaded table: its audit on a chart, its rows with suspects marked, corrections and the lab's choice. */
@Component({
  selector: 'cw-reference-table-page',
  imports: [DecimalPipe, RouterLink, MatButton, ExcessVolumeChart, AuditedRows],
  templateUrl: './reference-table-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReferenceTablePage implements OnInit {
  private readonly store = inject(Store);
  readonly tableId = input.required<string>();
  protected readonly vm = this.store.selectSignal(selectReferenceTablePageViewModel);

  ngOnInit(): void {
    this.store.dispatch(ReferenceTablePageActions.opened({ tableId: Number(this.tableId()) }));
  }

  protected correctRow(correction: RowCorrection): void {
    const { rowId, ...rest } = correction;
    this.store.dispatch(ReferenceTablePageActions.rowCorrected({ tableId: Number(this.tableId()), rowId, correction: rest }));
  }

  protected chooseForLab(use: boolean): void {
    this.store.dispatch(ReferenceTablePageActions.labTableChosen({ tableId: use ? Number(this.tableId()) : null }));
  }
}
