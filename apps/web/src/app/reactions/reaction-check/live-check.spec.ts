import { Subject } from 'rxjs';

import type { CheckRequest, CheckView } from './check-reaction';
import { liveCheck } from './live-check';

describe('liveCheck', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('checks once after typing pauses, not per keystroke', () => {
    const typed = new Subject<CheckRequest>();
    const views: CheckView[] = [];
    typed.pipe(liveCheck(150)).subscribe((view) => views.push(view));
    for (const text of ['C', 'Ca', 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O']) {
      typed.next({ equation: text });
      vi.advanceTimersByTime(50);
    }
    expect(views).toHaveLength(0);
    vi.advanceTimersByTime(150);
    expect(views.map((view) => view.status)).toEqual(['balanced']);
    expect(views[0].proton?.perMole).toBe('-2');
  });

  it('skips a request equal to the last one', () => {
    const typed = new Subject<CheckRequest>();
    const views: CheckView[] = [];
    typed.pipe(liveCheck(10)).subscribe((view) => views.push(view));
    typed.next({ equation: 'H2 + O2 -> H2O', rockWeightPercent: 1 });
    vi.advanceTimersByTime(20);
    typed.next({ equation: 'H2 + O2 -> H2O', rockWeightPercent: 1 });
    vi.advanceTimersByTime(20);
    expect(views).toHaveLength(1);
  });
});
