/**
 * Formula functions of our own, registered with HyperFormula as a function
 * plugin. A reference yields a number as written in its cell's own unit, so
 * a conversion is always spelled out in the formula:
 *
 *   =CONVERTUNIT(gyroDensity, "deg/s/√Hz", "deg/√h")
 *
 * The conversion is `convert` from src/units, the same code the engine uses.
 */
import { CellError as FormulaError, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula } from 'hyperformula';
import { SigmaLedgerError } from '../errors';
import { convert } from '../units';

/** Name of the conversion function in formulas. */
export const CONVERT_FUNCTION = 'CONVERTUNIT';

/** Every message our functions return starts with this, so the sheet can tell unit errors from others. */
export const UNIT_ERROR_PREFIX = `${CONVERT_FUNCTION}: `;

type RunFunctionArgs = Parameters<UnitFunctions['runFunction']>;

/** The plugin class; HyperFormula instantiates it per engine. */
class UnitFunctions extends FunctionPlugin {
  static override implementedFunctions = {
    [CONVERT_FUNCTION]: {
      method: 'convertUnit',
      parameters: [
        { argumentType: FunctionArgumentType.NUMBER },
        { argumentType: FunctionArgumentType.STRING },
        { argumentType: FunctionArgumentType.STRING },
      ],
    },
  };

  /** CONVERTUNIT(value, fromUnit, toUnit): `value` in `toUnit`; a #VALUE! error naming the problem for unknown or incompatible units. */
  convertUnit(ast: { args: RunFunctionArgs[0] }, state: RunFunctionArgs[1]): ReturnType<FunctionPlugin['runFunction']> {
    return this.runFunction(ast.args, state, this.metadata(CONVERT_FUNCTION), (value: number, fromUnit: string, toUnit: string) => {
      try {
        return convert(value, fromUnit, toUnit, '');
      } catch (e) {
        if (!(e instanceof SigmaLedgerError)) throw e;
        return new FormulaError(ErrorType.VALUE, `${UNIT_ERROR_PREFIX}${e.message}`);
      }
    });
  }
}

let registered = false;

/**
 * Registers the functions with HyperFormula (a global registry shared by
 * every engine); safe to call more than once. Call before building an engine.
 * Throws nothing.
 */
export function registerUnitFunctions(): void {
  if (registered) return;
  const names = { [CONVERT_FUNCTION]: CONVERT_FUNCTION };
  HyperFormula.registerFunctionPlugin(UnitFunctions, { enGB: names, enUS: names });
  registered = true;
}
