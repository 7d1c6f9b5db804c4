// The tool version recorded in results, ledgers and counterexample files.
export const TOOL_VERSION = '0.1.0';
