import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatIconRegistry } from '@angular/material/icon';
import { RouterOutlet } from '@angular/router';

/** The root: every screen comes through the router. */
@Component({
  selector: 'tl-root',
  imports: [RouterOutlet],
  template: '<router-outlet />',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  constructor() {
    // Icons are ligatures of the Material Symbols font that fonts/ ships.
    inject(MatIconRegistry).setDefaultFontSetClass('material-symbols-outlined');
  }
}
