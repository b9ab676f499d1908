/** What every screen is given by App. */
export interface ScreenProps {
  readonly width: number;
  readonly height: number;
  /** Only the screen on top is active; the ones below keep their state, hidden. */
  readonly isActive: boolean;
}
