/** A gentle two-note chime and a short buzz when the phase changes. */
export class PhaseSignal {
  private audio: AudioContext | null = null;

  /** Browsers allow sound only after a tap; call this from one. */
  unlock(): void {
    const Context =
      globalThis.AudioContext ??
      (globalThis as { webkitAudioContext?: typeof AudioContext }).webkitAudioContext;
    if (!Context) return;
    this.audio ??= new Context();
    void this.audio.resume?.();
  }

  play(): void {
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

  close(): void {
    void this.audio?.close();
    this.audio = null;
  }
}
