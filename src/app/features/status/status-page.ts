import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import type { HealthDto } from '../../../../shared/types';
import { HealthApi } from '../../core/api/health-api';
import { ICONS } from '../../core/icons/shipped-icon';

/** Shows whether the Conewise server and its database answer. */
@Component({
  selector: 'cw-status-page',
  imports: [MatCardModule, ...ICONS, MatButtonModule],
  templateUrl: './status-page.html',
  styleUrl: './status-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatusPage {
  private readonly healthApi = inject(HealthApi);

  protected readonly health = signal<HealthDto | null>(null);
  protected readonly unreachable = signal(false);

  constructor() {
    this.refresh();
  }

  protected refresh(): void {
    this.unreachable.set(false);
    this.healthApi.read().subscribe({
      next: (health) => this.health.set(health),
      error: (error: unknown) => {
        const body = error instanceof HttpErrorResponse ? (error.error as HealthDto | null) : null;
        if (body && typeof body === 'object' && 'db' in body) this.health.set(body);
        else this.unreachable.set(true);
      },
    });
  }
}
