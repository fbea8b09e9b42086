import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { AuthState } from '../auth/auth-state';
import type { UserRole } from '../../../../shared/contracts/auth';
import { ColorScheme } from '../theme/color-scheme';
import { BrandMark } from './brand-mark';

/** One entry of the main navigation and the roles that see it. */
interface NavLink {
  readonly path: string;
  readonly label: string;
  readonly icon: string;
  readonly roles: readonly UserRole[];
}

/** Every main navigation entry; the shell shows those the signed-in user's role allows. */
const NAV_LINKS: readonly NavLink[] = [
  { path: '/systems', label: 'Systems', icon: 'water', roles: ['admin', 'instructor', 'member'] },
  // Everyone: instructors teach classes there, and any member may be a student in one.
  { path: '/classes', label: 'Classes', icon: 'school', roles: ['admin', 'instructor', 'member'] },
  { path: '/admin', label: 'Admin', icon: 'admin_panel_settings', roles: ['admin'] },
];

/**
 * The frame around every page: toolbar with the mark, navigation by role, the light/dark switch
 * and the account menu; the routed page; a footer with the safety cautions link.
 */
@Component({
  selector: 'tw-shell',
  imports: [
    BrandMark,
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatToolbarModule,
    RouterLink,
    RouterLinkActive,
    RouterOutlet,
  ],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly auth = inject(AuthState);
  private readonly colorScheme = inject(ColorScheme);
  private readonly router = inject(Router);

  protected readonly user = this.auth.user;
  protected readonly sessionKnown = this.auth.loaded;
  protected readonly links = computed(() => {
    const role = this.auth.role();
    return role ? NAV_LINKS.filter((link) => link.roles.includes(role)) : [];
  });
  protected readonly isDark = computed(() => this.colorScheme.scheme() === 'dark');
  protected readonly schemeIcon = computed(() => (this.isDark() ? 'light_mode' : 'dark_mode'));
  protected readonly schemeToggleLabel = computed(() =>
    this.isDark() ? 'Switch to the light theme' : 'Switch to the dark theme',
  );

  constructor() {
    void this.auth.ready();
  }

  protected toggleScheme(): void {
    this.colorScheme.toggle();
  }

  protected async signOut(): Promise<void> {
    await this.auth.signOut();
    await this.router.navigateByUrl('/');
  }
}
