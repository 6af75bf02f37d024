import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { map } from 'rxjs';

import { describeProblem } from '../../core/error-messages';
import { toProblem } from '../../core/problem';
import { OutboxApi } from '../outbox-api';
import { splitLinks } from './split-links';

/**
 * The e-mail Tallus sent, as the development server's fake SMTP server received it:
 * lets owners follow invitation links without a real mailbox.
 */
@Component({
  selector: 'tl-outbox',
  imports: [DatePipe, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './outbox.html',
  styleUrl: './outbox.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Outbox {
  private readonly api = inject(OutboxApi);

  protected readonly messages = rxResource({
    stream: () =>
      this.api
        .list()
        .pipe(map((messages) => messages.map((message) => ({ ...message, parts: splitLinks(message.text) })))),
  });
  protected readonly problem = computed(() => {
    const error = this.messages.error();
    return error ? toProblem(error) : null;
  });
  /** Whether the server has no outbox because it runs in production. */
  protected readonly isUnavailable = computed(() => this.problem()?.status === 404);
  protected readonly errorMessage = computed(() => {
    const problem = this.problem();
    return problem ? describeProblem(problem) : null;
  });
}
