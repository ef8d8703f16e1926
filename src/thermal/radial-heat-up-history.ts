/**
 * What a {@link radialHeatUp} run records after each accepted step: the surface, core and mean
 * curves, each node's peak temperature and the hardening depth, the times the curves reach the
 * target, the heating switched off at the stop target and the soak that follows.
 *
 * @packageDocumentation
 */
import type { RadialHeatUpInput } from "./radial-heat-up-input.js";

/** Curves and events of one run (absolute temperatures [K], times [s]). */
export class RadialHistory {
  readonly times: number[] = [0];
  readonly surfaceTemperatures: number[];
  readonly coreTemperatures: number[];
  readonly meanTemperatures: number[];
  readonly hardeningDepths: number[] | null;
  /** Highest absolute temperature of each node so far. */
  readonly peak: Float64Array;
  /** Surface temperature farthest from ambient so far. */
  hottest: number;
  timeToSurfaceTarget: number | null;
  timeToCoreTarget: number | null;
  timeToMeanTarget: number | null;
  heating = true;
  heatingTime: number | null = null;
  differenceAtStop: number | null = null;
  soakTime: number | null = null;

  constructor(
    private readonly p: RadialHeatUpInput,
    private readonly x: Float64Array,
    private readonly span: number,
  ) {
    const { initial, target, stopAt, soakBand, hardening, cells } = p;
    this.surfaceTemperatures = [initial];
    this.coreTemperatures = [initial];
    this.meanTemperatures = [initial];
    this.peak = new Float64Array(cells + 1).fill(initial);
    this.hardeningDepths = hardening === null ? null : [this.hardeningDepthNow()];
    this.hottest = initial;
    this.timeToSurfaceTarget = target !== null && initial === target ? 0 : null;
    this.timeToCoreTarget = this.timeToSurfaceTarget;
    this.timeToMeanTarget = this.timeToSurfaceTarget;
    if (stopAt !== null && target === initial) {
      this.heating = false;
      this.heatingTime = 0;
      this.differenceAtStop = 0;
      if (soakBand !== null) this.soakTime = 0;
    }
  }

  /** True once the heating has stopped and, when a soak band is set, the soak has ended. */
  get done(): boolean {
    return this.heatingTime !== null && (this.p.soakBand === null || this.soakTime !== null);
  }

  /** Depth below the surface down to which the peak temperature reached the hardening temperature [m]. */
  private hardeningDepthNow(): number {
    const { hardening, cells: n, size } = this.p;
    const { peak, x } = this;
    if (hardening === null || peak[n]! < hardening) return 0;
    let j = n;
    while (j > 0 && peak[j - 1]! >= hardening) j--;
    if (j === 0) return this.span;
    const a = peak[j - 1]!;
    const b = peak[j]!;
    const r = x[j - 1]! + ((x[j]! - x[j - 1]!) * (hardening - a)) / (b - a);
    return size - r;
  }

  /**
   * Records the accepted step from `previousTime` to `time` ending in offsets `T` with
   * volume-mean offset `meanOffset`; `stopsNow` when it landed on the stop target.
   */
  record(previousTime: number, time: number, T: Float64Array, meanOffset: number, stopsNow: boolean): void {
    const { initial, ambient, target, soakBand, cells: n } = this.p;
    const previousSurface = this.surfaceTemperatures[this.surfaceTemperatures.length - 1]!;
    const previousCore = this.coreTemperatures[this.coreTemperatures.length - 1]!;
    const previousMean = this.meanTemperatures[this.meanTemperatures.length - 1]!;
    this.times.push(time);
    const surfaceNow = initial + T[n]!;
    const coreNow = initial + T[0]!;
    const meanNow = initial + meanOffset;
    this.surfaceTemperatures.push(surfaceNow);
    this.coreTemperatures.push(coreNow);
    this.meanTemperatures.push(meanNow);
    const peak = this.peak;
    for (let i = 0; i <= n; i++) if (initial + T[i]! > peak[i]!) peak[i] = initial + T[i]!;
    if (this.hardeningDepths !== null) this.hardeningDepths.push(this.hardeningDepthNow());
    if (Math.abs(surfaceNow - ambient) > Math.abs(this.hottest - ambient)) this.hottest = surfaceNow;
    if (target !== null) {
      if (this.timeToSurfaceTarget === null) this.timeToSurfaceTarget = crossing(previousTime, time, previousSurface, surfaceNow, target, initial);
      if (this.timeToCoreTarget === null) this.timeToCoreTarget = crossing(previousTime, time, previousCore, coreNow, target, initial);
      if (this.timeToMeanTarget === null) this.timeToMeanTarget = crossing(previousTime, time, previousMean, meanNow, target, initial);
    }
    if (stopsNow) {
      this.heating = false;
      this.heatingTime = time;
      this.differenceAtStop = surfaceNow - coreNow;
      if (soakBand !== null && Math.abs(this.differenceAtStop) <= soakBand) this.soakTime = 0;
    } else if (!this.heating && soakBand !== null && this.soakTime === null && this.heatingTime !== null) {
      const now = surfaceNow - coreNow;
      if (Math.abs(now) <= soakBand) {
        const before = Math.abs(previousSurface - previousCore);
        const at = before > soakBand ? previousTime + ((time - previousTime) * (before - soakBand)) / (before - Math.abs(now)) : time;
        this.soakTime = at - this.heatingTime;
      }
    }
  }
}

/** Linear-interpolated time at which a curve moving away from `start` first reaches `target`. */
function crossing(t0: number, t1: number, v0: number, v1: number, target: number, start: number): number | null {
  const rising = target > start;
  if (rising ? v1 >= target && v0 < target : v1 <= target && v0 > target) {
    return t0 + ((t1 - t0) * (target - v0)) / (v1 - v0);
  }
  return null;
}
