import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import type { Member } from '@tallus/contracts';

/** What the removal dialog needs to know. */
export interface RemoveMemberData {
  member: Member;
  teamName: string;
  /** Whether the user is removing themselves (leaving the team). */
  isSelf: boolean;
}

/** Asks before a member is removed; closes with true to go ahead. */
@Component({
  selector: 'tl-remove-member-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>{{ data.isSelf ? 'Leave the team?' : 'Remove member?' }}</h2>
    <mat-dialog-content>
      @if (data.isSelf) {
        <p>You will lose access to “{{ data.teamName }}” until an owner invites you again.</p>
      } @else {
        <p>
          {{ data.member.displayName }} ({{ data.member.email }}) will lose access to “{{ data.teamName }}”.
          Their past work stays in the team.
        </p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" cdkFocusInitial>Cancel</button>
      <button mat-flat-button type="button" class="danger" [mat-dialog-close]="true">
        {{ data.isSelf ? 'Leave team' : 'Remove' }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .danger {
      --mat-button-filled-container-color: var(--tl-danger);
      --mat-button-filled-label-text-color: #fff8f6;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RemoveMemberDialog {
  protected readonly data = inject<RemoveMemberData>(MAT_DIALOG_DATA);
}
