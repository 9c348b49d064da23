// Numbers as a countdown shows them. Pure, so the page and its tests agree on every boundary.

/**
 * Whole seconds left, rounded up as a countdown reads: 4.2 s left shows 5, and 4 once exactly 4 s remain, so the
 * figure changes on each whole second and shows 0 only when the time is up. The value is rounded to the
 * millisecond first so that arithmetic dust (4.0000000001) does not show as 5.
 */
export function secondsToShow(secondsLeft: number): number {
  return Math.max(Math.ceil(Math.round(secondsLeft * 1000) / 1000), 0);
}

/** Minutes and seconds for a duration in seconds, counted the same way (rounded up to the whole second). */
export function minutesAndSeconds(secondsLeft: number): { minutes: number; seconds: number } {
  const whole = secondsToShow(secondsLeft);
  return { minutes: Math.floor(whole / 60), seconds: whole % 60 };
}
