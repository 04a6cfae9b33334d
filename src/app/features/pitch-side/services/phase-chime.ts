import { DestroyRef, inject, Injectable } from '@angular/core';
import type { ClockReading } from './phase-clock';

/** A gentle two-note chime and a short buzz when the running clock crosses into another phase. */
@Injectable()
export class PhaseChime {
  private audio: AudioContext | null = null;
  /** The phase (or the end, as the phase count) last seen while the clock ran; -1 while it did not. */
  private lastMarker = -1;

  constructor() {
    inject(DestroyRef).onDestroy(() => this.close());
  }

  /** Browsers allow sound only after a tap; call this from one. */
  unlock(): void {
    const Context =
      globalThis.AudioContext ??
      (globalThis as { webkitAudioContext?: typeof AudioContext }).webkitAudioContext;
    if (!Context) return;
    this.audio ??= new Context();
    void this.audio.resume?.();
  }

  /**
   * Chimes when this reading of the running clock is in another phase (or past the end) than the
   * last one; a start, a resume or a reading while paused only remembers. Says whether it rang.
   */
  ringOnPhaseChange(reading: ClockReading, phaseCount: number, running: boolean): boolean {
    const marker = reading.finished ? phaseCount : reading.phaseIndex;
    const rings = running && this.lastMarker !== -1 && marker !== this.lastMarker;
    this.lastMarker = running ? marker : -1;
    if (rings) this.play();
    return rings;
  }

  private play(): void {
    globalThis.navigator?.vibrate?.([160, 90, 160]);
    const audio = this.audio;
    if (!audio) return;
    const start = audio.currentTime + 0.02;
    [587, 784].forEach((frequency, index) => {
      const oscillator = audio.createOscillator();
      const gain = audio.createGain();
      oscillator.type = 'sine';
      oscillator.frequency.value = frequency;
      const at = start + index * 0.22;
      gain.gain.setValueAtTime(0.0001, at);
      gain.gain.exponentialRampToValueAtTime(0.18, at + 0.03);
      gain.gain.exponentialRampToValueAtTime(0.0001, at + 0.2);
      oscillator.connect(gain).connect(audio.destination);
      oscillator.start(at);
      oscillator.stop(at + 0.22);
    });
  }

  private close(): void {
    void this.audio?.close();
    this.audio = null;
  }
}
