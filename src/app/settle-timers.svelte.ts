/**
 * Settling timers: a meter needs about 1–3 minutes for CO₂, and 10–20 minutes for humidity after
 * a change of temperature, before its reading can be trusted (practice.md §2.4; common practice
 * (no published source) for the defaults of 2 and 15 minutes). The app keeps time so the surveyor
 * need not; a timer runs on across screens until it is done or restarted, and remembers where it
 * was started ("outdoors", a room's name), so a timer started at the door does not pass for the
 * room's own.
 */
export const SETTLE_S = { co2: 120, humidity: 900 } as const;
export type SettleKind = keyof typeof SETTLE_S;

class SettleTimers {
  /** When each timer ends (ms since 1970), or null. */
  endsAt = $state<Record<SettleKind, number | null>>({ co2: null, humidity: null });
  /** Where each timer was started (a place's name), or null. */
  startedAt = $state<Record<SettleKind, string | null>>({ co2: null, humidity: null });
  /** The clock, ticking once a second while a timer runs. */
  now = $state(Date.now());
  private ticker: ReturnType<typeof setInterval> | undefined;

  start(kind: SettleKind, place: string | null = null, seconds: number = SETTLE_S[kind]): void {
    this.now = Date.now();
    this.startedAt[kind] = place;
    this.endsAt[kind] = this.now + seconds * 1000;
    this.ticker ??= setInterval(() => this.tick(), 1000);
  }

  /** Seconds left (0 once settled), or null when not started. */
  left(kind: SettleKind): number | null {
    const end = this.endsAt[kind];
    return end === null ? null : Math.max(0, Math.ceil((end - this.now) / 1000));
  }

  private tick(): void {
    this.now = Date.now();
    if (Object.values(this.endsAt).every((end) => end === null || end <= this.now)) {
      clearInterval(this.ticker);
      this.ticker = undefined;
    }
  }
}

export const settleTimers = new SettleTimers();

/** 95 s → "1:35". */
export function clock(seconds: number): string {
  return `${Math.floor(seconds / 60)}:${String(Math.floor(seconds % 60)).padStart(2, '0')}`;
}

/** The place a room's timers are started for (its name). Example: settlePlace({ name: '' }) = 'this room'. */
export function settlePlace(room: { name: string }): string {
  return room.name || 'this room';
}
