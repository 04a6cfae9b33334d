/** Keeps the phone's screen on while the session runs, where the browser offers Wake Lock. */
export class ScreenAwake {
  private sentinel: WakeLockSentinel | null = null;
  private wanted = false;
  private readonly reacquire = () => {
    if (this.wanted && document.visibilityState === 'visible') void this.acquire();
  };

  /** Whether this browser can keep the screen awake at all. */
  get supported(): boolean {
    return typeof navigator !== 'undefined' && 'wakeLock' in navigator;
  }

  async keepOn(): Promise<boolean> {
    this.wanted = true;
    document.addEventListener('visibilitychange', this.reacquire);
    return this.acquire();
  }

  async release(): Promise<void> {
    this.wanted = false;
    document.removeEventListener('visibilitychange', this.reacquire);
    const sentinel = this.sentinel;
    this.sentinel = null;
    if (sentinel && !sentinel.released) await sentinel.release().catch(() => undefined);
  }

  private async acquire(): Promise<boolean> {
    if (!this.supported) return false;
    try {
      this.sentinel = await navigator.wakeLock.request('screen');
      return true;
    } catch {
      // Refused (battery saver, hidden tab): the session still runs, the screen may dim.
      return false;
    }
  }
}
