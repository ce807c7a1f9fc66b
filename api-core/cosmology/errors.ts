/**
 * The one error the engine throws for bad input. `parameter` names the offending input
 * (e.g. "omegaDE", "neutrinoMasses", "z") so the HTTP layer can answer 422 naming it.
 */
export class CosmologyError extends Error {
  readonly parameter: string;

  constructor(parameter: string, message: string) {
    super(message);
    this.name = "CosmologyError";
    this.parameter = parameter;
  }
}
