import { EnvironmentProviders, inject, provideEnvironmentInitializer } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';

/** Makes `mat-icon` use the self-hosted Material Symbols font; given on the routes that show icons. */
export function provideMaterialSymbols(): EnvironmentProviders {
  return provideEnvironmentInitializer(() => {
    inject(MatIconRegistry).setDefaultFontSetClass('material-symbols-outlined');
  });
}
