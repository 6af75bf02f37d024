import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The frame of the signed-out pages: Tallus's name and purpose beside a form. */
@Component({
  selector: 'tl-auth-frame',
  templateUrl: './auth-frame.html',
  styleUrl: './auth-frame.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuthFrame {}
