export interface ConfigProblem {
  variable: string;
  message: string;
}

/** The environment cannot configure the server; the message names each variable and what is wrong with it. */
export class ConfigError extends Error {
  readonly variable: string;

  constructor(readonly problems: ConfigProblem[]) {
    super(['Invalid configuration:', ...problems.map((p) => `  ${p.variable}: ${p.message}`)].join('\n'));
    this.name = 'ConfigError';
    this.variable = problems[0]?.variable ?? '';
  }
}
