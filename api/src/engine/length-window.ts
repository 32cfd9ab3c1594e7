import { EngineError } from './engine-error';
import { formatLength, LengthUnit, Nanometres } from './units';

/**
 * Length window: does a part with a plunge range (e.g. a slip-jointed driveshaft, a shock) stay
 * inside its travel over the installed length's whole range (e.g. suspension bump to droop)?
 *
 * - Compression left = shortest installed length − the part's fully compressed length.
 *   Below zero the part bottoms out before the installation reaches its shortest.
 * - Extension left = the part's fully extended length − longest installed length.
 *   Below zero the part pulls apart (or tops out) before the installation reaches its longest.
 * The creator's margin rule sets the minimum travel that must remain each way
 * (leaving travel at both ends is common practice; the amounts are the creator's call).
 */

export interface LengthWindowInput {
  /** The part's own range: fully compressed and fully extended lengths, integer nm. */
  assembled: { compressedNm: Nanometres; extendedNm: Nanometres };
  /** Distance between the part's mounting points at their closest and farthest, integer nm. */
  installed: { minNm: Nanometres; maxNm: Nanometres };
  /** Minimum travel that must remain each way, integer nm; zero when omitted. */
  margin?: { compressionNm?: Nanometres; extensionNm?: Nanometres };
  /** Unit (and optional resolution) used to write lengths in the reasons; millimetres by default. */
  display?: { unit: LengthUnit; resolutionNm?: Nanometres };
}

export interface LengthWindowResult {
  status: 'pass' | 'fail';
  compressionLeftNm: Nanometres;
  extensionLeftNm: Nanometres;
  /** extended − compressed. */
  plungeAvailableNm: Nanometres;
  /** installed max − installed min. */
  travelNeededNm: Nanometres;
  reasons: string[];
}

export type LengthWindowErrorCode = 'LENGTH_WINDOW_INVALID';

export class LengthWindowError extends EngineError {
  constructor(message: string, code: LengthWindowErrorCode = 'LENGTH_WINDOW_INVALID') {
    super(message, code);
  }
}

export function checkLengthWindow(input: LengthWindowInput): LengthWindowResult {
  const { compressedNm, extendedNm } = input.assembled;
  const { minNm, maxNm } = input.installed;
  const marginCompressionNm = input.margin?.compressionNm ?? 0;
  const marginExtensionNm = input.margin?.extensionNm ?? 0;
  validate({ compressedNm, extendedNm, minNm, maxNm, marginCompressionNm, marginExtensionNm });

  const show = (nm: Nanometres) => formatLength(nm, input.display?.unit ?? 'mm', input.display?.resolutionNm);
  const compressionLeftNm = minNm - compressedNm;
  const extensionLeftNm = extendedNm - maxNm;
  const plungeAvailableNm = extendedNm - compressedNm;
  const travelNeededNm = maxNm - minNm;

  const failures: string[] = [];
  if (travelNeededNm > plungeAvailableNm) {
    failures.push(
      `the installed length varies by ${show(travelNeededNm)} but the part plunges only ${show(plungeAvailableNm)}: no assembled length covers both ends`,
    );
  }
  failures.push(
    ...travelFailures({
      leftNm: compressionLeftNm,
      marginNm: marginCompressionNm,
      beyondLimit: (short) => `bottoms out: at the shortest installed length it needs ${show(short)} more compression than it has`,
      belowMargin: (left) => `compression left at the shortest installed length is ${show(left)}, less than the ${show(marginCompressionNm)} margin`,
    }),
    ...travelFailures({
      leftNm: extensionLeftNm,
      marginNm: marginExtensionNm,
      beyondLimit: (short) => `pulls apart: at the longest installed length it needs ${show(short)} more extension than it has`,
      belowMargin: (left) => `extension left at the longest installed length is ${show(left)}, less than the ${show(marginExtensionNm)} margin`,
    }),
  );

  const reasons =
    failures.length > 0
      ? failures
      : [
          `compression left at the shortest installed length: ${show(compressionLeftNm)} (margin ${show(marginCompressionNm)})`,
          `extension left at the longest installed length: ${show(extensionLeftNm)} (margin ${show(marginExtensionNm)})`,
        ];
  return {
    status: failures.length > 0 ? 'fail' : 'pass',
    compressionLeftNm,
    extensionLeftNm,
    plungeAvailableNm,
    travelNeededNm,
    reasons,
  };
}

function travelFailures(check: {
  leftNm: Nanometres;
  marginNm: Nanometres;
  beyondLimit: (shortNm: Nanometres) => string;
  belowMargin: (leftNm: Nanometres) => string;
}): string[] {
  if (check.leftNm < 0) return [check.beyondLimit(-check.leftNm)];
  if (check.leftNm < check.marginNm) return [check.belowMargin(check.leftNm)];
  return [];
}

interface WindowValues {
  compressedNm: number;
  extendedNm: number;
  minNm: number;
  maxNm: number;
  marginCompressionNm: number;
  marginExtensionNm: number;
}

function validate(values: WindowValues): void {
  for (const [name, value] of Object.entries(values)) {
    if (!Number.isSafeInteger(value)) {
      throw new LengthWindowError(`${name} must be a whole number of nanometres; got ${String(value)}`);
    }
  }
  if (values.compressedNm <= 0 || values.minNm <= 0) throw new LengthWindowError('lengths must be greater than zero');
  if (values.compressedNm > values.extendedNm) {
    throw new LengthWindowError('the compressed length must not exceed the extended length');
  }
  if (values.minNm > values.maxNm) {
    throw new LengthWindowError('the shortest installed length must not exceed the longest');
  }
  if (values.marginCompressionNm < 0 || values.marginExtensionNm < 0) {
    throw new LengthWindowError('margins must not be negative');
  }
}
