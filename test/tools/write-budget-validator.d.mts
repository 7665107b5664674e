// Types of the validator generator (write-budget-validator.mjs) for TypeScript tests.
export const VALIDATOR_OPTIONS: { allowUnionTypes: boolean; verbose: boolean };
export const GENERATED_PATH: string;
export function generatedValidatorText(): Promise<string>;
