import { ChangeDetectionStrategy, Component } from '@angular/core';
import { Shell } from './core/shell/shell';

/** The root component: the shell, which hosts the routed pages. */
@Component({
  selector: 'tw-root',
  imports: [Shell],
  template: '<tw-shell />',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {}
