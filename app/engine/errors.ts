/** An input the engine cannot evaluate; `field` names the offending request field (dot path). */
export class EngineInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "EngineInputError";
    this.field = field;
  }
}
