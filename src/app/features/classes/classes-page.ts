import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The classes landing page (its content lands with the classes feature). */
@Component({
  selector: 'tw-classes-page',
  template: '<h1>Classes</h1>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClassesPage {}
