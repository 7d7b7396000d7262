/** What the survey reads of a face (a FaceGeometry has it all). */
export interface SurveyFace {
  facing: number;
  /** Signed: negative for a face that looks down. */
  shadowArea: number;
  z0: number;
  z2: number;
  steep: boolean;
}

/**
 * What the exact fill needs from the faces that look up or down, added face by face: whether
 * anything hangs over free space (a face that looks down, is not a wall and stands above the
 * table), the shadows of the faces that look down (the area they cover), the lowest floor, and
 * what raised wall-like faces that look down could hold at most (shadow × height).
 */
export class OverhangSurvey {
  present = false;
  coveredAreaMm2 = 0;
  lowestFloorMm = Infinity;
  wallSliverMm3 = 0;

  constructor(
    private readonly zMin: number,
    private readonly height: number,
    private readonly tableToleranceMm: number,
  ) {}

  /**
   * One face: its facing (1 up, -1 down), signed shadow, lowest and highest corner, and whether it
   * is a wall. Read from an object filled again face after face: numbers passed one by one would
   * each be boxed on the heap where the call is not inlined, a million times for a big mould.
   */
  add(face: SurveyFace): void {
    const { facing, shadowArea: signedShadow, z0, z2, steep } = face;
    // Every test is made on every face (a test first met deep into a file would throw the
    // compiled code away): files often list all the faces that look up before any that look down.
    const up = facing > 0,
      down = facing < 0,
      raised = z2 > this.zMin + this.tableToleranceMm;
    if (up) {
      this.lowestFloorMm = Math.min(this.lowestFloorMm, z0);
    } else if (down) {
      this.coveredAreaMm2 -= signedShadow;
      if (raised) {
        if (steep) this.wallSliverMm3 -= signedShadow * this.height;
        else this.present = true;
      }
    }
  }
}
