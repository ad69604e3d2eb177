import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { BuiltinTable } from '../builtin-table/builtin-table';
import { ReferenceTableList } from '../reference-table-list/reference-table-list';
import { TableUpload } from '../reference-tables-client';
import { ReferenceTablesPageActions } from '../state/reference-tables-page.actions';
import { selectReferenceTablesPageViewModel } from '../state/reference-tables.selectors';
import { TableUploadForm } from '../table-upload-form/table-upload-form';

/** The Reference tables area: uploaded tables, the lab's choice, an upload form and the built-in equation. */
@Component({
  selector: 'cw-reference-tables-page',
  imports: [ReferenceTableList, TableUploadForm, BuiltinTable],
  template: `
    @let v = vm();
    <section class="cw-page">
      <h1>Reference tables</h1>
      <p>Density tables of ethanol–water mixtures. An uploaded table is audited: each row's excess molar volume is set against a smooth
        Redlich–Kister curve, and a row that stands out (often a typing error) is marked with a suggested value.</p>
      @if (v.loadError; as message) {
        <p class="cw-form-error" role="alert">{{ message }}</p>
      }
      <cw-reference-table-list [tables]="v.tables" [labTableId]="v.labTableId" [canChoose]="v.canKeep" [loading]="v.loading" [timeZone]="timeZone()" (labTableChosen)="chooseLabTable($event)" />
      @if (v.canKeep) {
        <cw-table-upload-form [uploading]="v.uploading" [error]="v.uploadError" [problems]="v.uploadProblems" (submitted)="uploadTable($event)" />
      }
      <cw-builtin-table />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReferenceTablesPage implements OnInit {
  private readonly store = inject(Store);
  protected readonly vm = this.store.selectSignal(selectReferenceTablesPageViewModel);
  protected readonly timeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);

  ngOnInit(): void {
    this.store.dispatch(ReferenceTablesPageActions.opened());
  }

  protected uploadTable(upload: TableUpload): void {
    this.store.dispatch(ReferenceTablesPageActions.uploadSubmitted({ upload }));
  }

  protected chooseLabTable(tableId: number | null): void {
    this.store.dispatch(ReferenceTablesPageActions.labTableChosen({ tableId }));
  }
}
