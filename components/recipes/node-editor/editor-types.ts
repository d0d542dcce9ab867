/** A recorded framing of a target, as the stage editor offers it. */
export type EditorFraming = { id: string; name: string; raDeg: number; decDeg: number; positionAngleDeg: number };

/** A target the stage editor can point at. */
export type EditorTarget = { id: string; designation: string; name: string; framings?: EditorFraming[] };
