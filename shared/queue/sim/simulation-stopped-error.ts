/** Thrown by `simulate` when the caller's `shouldStop()` returned true; no partial result is given. */
export class SimulationStoppedError extends Error {
  /** Fraction of the run completed when it stopped, 0–1. */
  readonly fractionDone: number;

  constructor(fractionDone: number) {
    super('The simulation was stopped before it finished.');
    this.name = 'SimulationStoppedError';
    this.fractionDone = fractionDone;
  }
}
