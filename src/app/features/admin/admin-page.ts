import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatTabsModule } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

/** Administration: tabs for the users table and the mail outbox. */
@Component({
  selector: 'tw-admin-page',
  imports: [MatIconModule, MatTabsModule, RouterLink, RouterLinkActive, RouterOutlet],
  template: `
    <h1 class="title">Administration</h1>
    <nav mat-tab-nav-bar [tabPanel]="panel" aria-label="Administration">
      <a
        mat-tab-link
        routerLink="users"
        routerLinkActive
        #users="routerLinkActive"
        [active]="users.isActive"
      >
        <mat-icon class="tab-icon">group</mat-icon> Users
      </a>
      <a
        mat-tab-link
        routerLink="outbox"
        routerLinkActive
        #outbox="routerLinkActive"
        [active]="outbox.isActive"
      >
        <mat-icon class="tab-icon">outbox</mat-icon> Outbox
      </a>
    </nav>
    <mat-tab-nav-panel #panel class="panel">
      <router-outlet />
    </mat-tab-nav-panel>
  `,
  styles: `
    .title {
      margin: 0 0 8px;
      font: var(--mat-sys-headline-medium);
    }
    .tab-icon {
      margin-right: 6px;
    }
    .panel {
      display: block;
      padding-top: 16px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdminPage {}
