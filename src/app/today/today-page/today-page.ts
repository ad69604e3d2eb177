import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { AreaCard } from '../area-card/area-card';
import { selectTodayAreaCards } from '../today.selectors';
import { RoleBadge } from '@app/ui/role-badge/role-badge';
import { MyBatches } from '../my-batches/my-batches';
import { TodayPageActions } from '../state/today-page.actions';
import { selectMyActiveBatches } from '../today.selectors';
import { selectTodayStockAlerts } from '@app/stock/state/stock.selectors';
import { StockAlertsPanel } from '../stock-alerts/stock-alerts';

@Component({
  selector: 'cw-today-page',
  imports: [AreaCard, RoleBadge, MyBatches, StockAlertsPanel],
  templateUrl: './today-page.html',
  styleUrl: './today-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TodayPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly user = this.store.selectSignal(authFeature.selectUser);
  protected readonly roles = this.store.selectSignal(authFeature.selectRoles);
  protected readonly coopTimeZone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly areas = this.store.selectSignal(selectTodayAreaCards);
  protected readonly myBatches = this.store.selectSignal(selectMyActiveBatches);
  protected readonly stockAlerts = this.store.selectSignal(selectTodayStockAlerts);

  ngOnInit(): void {
    this.store.dispatch(TodayPageActions.opened());
  }
}
