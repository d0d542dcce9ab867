/*
 * Camera cooling and the night's temperature curve (dry-run.md "cool/warm"; trade-defaults.md
 * "cooling": set-point −10 °C (S1, S35), largest drop below ambient 30 °C (S2), rate 3 °C/min
 * (practice; S3)).
 */

/** Where the ambient curve is anchored: dusk and dawn instants and temperatures. */
export interface TemperatureCurve {
  duskMs: number;
  dawnMs: number;
  duskTempC: number;
  dawnTempC: number;
}

/**
 * Ambient temperature at an instant: linear interpolation between the site's dusk and dawn
 * temperatures across the dark window, held constant before dusk and after dawn. A straight
 * line is a simplification (nights cool fastest early on); it is what the site form asks for.
 */
export function ambientTempC(curve: TemperatureCurve, ms: number): number {
  const span = curve.dawnMs - curve.duskMs;
  if (span <= 0 || ms <= curve.duskMs) return curve.duskTempC;
  if (ms >= curve.dawnMs) return curve.dawnTempC;
  return curve.duskTempC + ((ms - curve.duskMs) / span) * (curve.dawnTempC - curve.duskTempC);
}

/** The coldest sensor temperature the cooler can hold: ambient − largest drop below ambient (S2). */
export function reachableSetpointC(ambientC: number, maxDeltaBelowAmbientC: number): number {
  return ambientC - maxDeltaBelowAmbientC;
}

/**
 * Seconds to change the sensor temperature: |ΔT| / rate (dry-run.md "cool/warm").
 * Example: 10 °C → −10 °C at 3 °C/min = 20 / 3 min = 6.67 min = 400 s.
 */
export function temperatureChangeS(fromC: number, toC: number, rateCPerMin: number): number {
  return (Math.abs(toC - fromC) / rateCPerMin) * 60;
}

export interface CoolPlan {
  /** The temperature the sensor ends at. */
  reachedC: number;
  durationS: number;
  /** False when the set-point lies below ambient − largest drop: the sensor stops short. */
  reachable: boolean;
}

/**
 * A cool-down from `sensorC` toward `setpointC`, limited by the camera's largest drop below
 * the ambient at that moment: the sensor goes no colder than ambient − maxDelta.
 */
export function planCoolDown(sensorC: number, setpointC: number, ambientC: number, maxDeltaBelowAmbientC: number, rateCPerMin: number): CoolPlan {
  const floor = reachableSetpointC(ambientC, maxDeltaBelowAmbientC);
  const reachedC = Math.max(setpointC, floor);
  return { reachedC, durationS: temperatureChangeS(sensorC, reachedC, rateCPerMin), reachable: setpointC >= floor };
}
