import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { STOCK_LIMITS, StockEntryUnit, toStockQuantity } from '@shared/stock';

/**
 * A typed quantity that, in its stored unit, lies within the stock limit (the same limit the
 * server's schema reads). `allowZero` for a count that found nothing left.
 */
export function stockQuantityValidator(unitOf: () => StockEntryUnit | null, allowZero = false): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const value = control.value as number | null;
    if (value === null || (control.value as unknown) === '') return null;
    if (!Number.isFinite(value) || value < 0 || (!allowZero && value === 0)) return { quantity: true };
    const unit = unitOf();
    if (unit && toStockQuantity(value, unit).quantity > STOCK_LIMITS.quantityMax) return { quantity: true };
    return null;
  };
}
