import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The systems landing page (its content lands with the systems feature). */
@Component({
  selector: 'tw-systems-page',
  template: '<h1>Systems</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SystemsPage {}
