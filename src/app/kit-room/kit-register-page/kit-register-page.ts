import { ChangeDetectionStrategy, Component, computed, inject, OnInit, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { MaintenanceEntryInput } from '@shared/kit';
import { KIT_STATE_LABELS, KitItemForm, KitItemSave } from '../kit-item-form/kit-item-form';
import { MaintenanceLog } from '../maintenance-log/maintenance-log';
import { KitRegisterPageActions } from '../state/kit-register-page.actions';
import { kitRoomFeature } from '../state/kit-room.feature';

@Component({
  selector: 'cw-kit-register-page',
  imports: [KitItemForm, MaintenanceLog, MatButton, RouterLink],
  templateUrl: './kit-register-page.html',
  styleUrl: './kit-register-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class KitRegisterPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly items = this.store.selectSignal(kitRoomFeature.selectItems);
  protected readonly selectedItemId = this.store.selectSignal(kitRoomFeature.selectSelectedItemId);
  protected readonly maintenance = this.store.selectSignal(kitRoomFeature.selectMaintenance);
  protected readonly itemFieldErrors = this.store.selectSignal(kitRoomFeature.selectItemFieldErrors);
  protected readonly itemsSaved = this.store.selectSignal(kitRoomFeature.selectItemsSaved);
  protected readonly maintenanceFieldErrors = this.store.selectSignal(kitRoomFeature.selectMaintenanceFieldErrors);
  protected readonly maintenanceRecorded = this.store.selectSignal(kitRoomFeature.selectMaintenanceRecorded);
  protected readonly loadError = this.store.selectSignal(kitRoomFeature.selectLoadError);
  protected readonly selectedItem = computed(() => this.items().find((item) => item.id === this.selectedItemId()) ?? null);
  protected readonly stateLabels = KIT_STATE_LABELS;
  /** True while the "new item" form is open instead of the selected item's details. */
  protected readonly adding = signal(false);

  ngOnInit(): void {
    this.store.dispatch(KitRegisterPageActions.opened());
  }

  protected select(kitItemId: number): void {
    this.adding.set(false);
    this.store.dispatch(KitRegisterPageActions.itemSelected({ kitItemId }));
  }

  protected saveItem({ kitItemId, input }: KitItemSave): void {
    if (kitItemId === null) this.store.dispatch(KitRegisterPageActions.itemSubmitted({ input }));
    else this.store.dispatch(KitRegisterPageActions.itemChanged({ kitItemId, changes: input }));
  }

  protected recordMaintenance(input: MaintenanceEntryInput): void {
    const kitItemId = this.selectedItemId();
    if (kitItemId !== null) this.store.dispatch(KitRegisterPageActions.maintenanceSubmitted({ kitItemId, input }));
  }
}
