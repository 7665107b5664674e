/** Sigma Ledger's version, printed in reports so a reviewer can rerun with the same tool (kept equal to package.json's by a test). */
export const TOOL_VERSION = '0.1.0';
