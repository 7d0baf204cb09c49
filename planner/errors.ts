// Planner error classes: each has a fixed `code` so callers (server, CLI) can map it without parsing messages.

export class PlannerError extends Error {
  readonly code: string;

  constructor(code: string, message: string) {
    super(message);
    this.name = new.target.name;
    this.code = code;
  }
}

/** A reference (site, span, slice, function, tie, tenant) names nothing in the inventory. */
export class UnknownElementError extends PlannerError {
  constructor(message: string) {
    super('UNKNOWN_ELEMENT', message);
  }
}

/** An option or argument is outside what the function accepts. */
export class InvalidOptionError extends PlannerError {
  constructor(message: string) {
    super('INVALID_OPTION', message);
  }
}

/** The scenario passed the schema but is still inconsistent (duplicate ids, a slice without placement, …). */
export class InvalidScenarioError extends PlannerError {
  constructor(message: string) {
    super('INVALID_SCENARIO', message);
  }
}
