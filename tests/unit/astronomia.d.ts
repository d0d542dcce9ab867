// Minimal types for the parts of `astronomia` (dev dependency, the tests' independent second
// opinion) that the unit tests use. Angles are radians; sidereal times are seconds of time.
declare module 'astronomia' {
  interface RaDec {
    ra: number;
    dec: number;
  }

  export const base: {
    J2000: number;
    JDEToJulianYear(jde: number): number;
  };

  export const julian: {
    DateToJD(date: Date): number;
    DateToJDE(date: Date): number;
    JDToDate(jd: number): Date;
  };

  export const sidereal: {
    /** Greenwich mean sidereal time, seconds of time in [0, 86400). */
    mean(jd: number): number;
    /** Greenwich apparent sidereal time, seconds of time in [0, 86400). */
    apparent(jd: number): number;
  };

  export const solar: {
    /** Apparent geocentric Sun of date, low precision (Meeus ch. 25). */
    apparentEquatorial(jde: number): RaDec;
  };

  export const nutation: {
    /** [Δψ, Δε] in radians. */
    nutation(jde: number): [number, number];
    meanObliquity(jde: number): number;
  };

  class Equatorial {
    constructor(ra?: number, dec?: number);
    ra: number;
    dec: number;
    /** `st` is Greenwich sidereal time in seconds of time; the azimuth is measured from south. */
    toHorizontal(g: { lat: number; lon: number }, st: number): { az: number; alt: number };
  }

  class Ecliptic {
    constructor(lon?: number, lat?: number);
    toEquatorial(obliquity: number): Equatorial;
  }

  export const coord: {
    Equatorial: typeof Equatorial;
    Ecliptic: typeof Ecliptic;
  };

  export const globe: {
    /** `lon` is measured positively WEST. */
    Coord: new (lat: number, lon: number) => { lat: number; lon: number };
  };

  export const precess: {
    /** Rigorous precession (Meeus 21.2–21.4) between Julian epochs, proper motion in radians/year. */
    position(eqFrom: Equatorial, epochFrom: number, epochTo: number, mRa: number, mDec: number): Equatorial;
  };

  export const moonposition: {
    /** Geocentric ecliptic longitude/latitude of date (radians) and distance (km), Meeus ch. 47. */
    position(jde: number): { lon: number; lat: number; range: number };
  };

  export const refraction: {
    /** Bennett: refraction (radians) for an apparent altitude h0 (radians). */
    bennett(h0: number): number;
    /** Saemundsson: refraction (radians) for a true altitude h (radians). */
    saemundsson(h: number): number;
  };
}
