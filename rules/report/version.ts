/**
 * The tool's version, as reports print it (`tool: "railcross X.Y.Z"`). Kept equal to
 * package.json's `version` by hand: the engine cannot read package.json (no Node built-ins,
 * and the browser bundle must not carry it); test/report/version.test.ts holds the two together.
 */
export const TOOL_VERSION = '0.1.0';

/** The `tool` field of a report: `railcross X.Y.Z`. */
export const TOOL_NAME = `railcross ${TOOL_VERSION}`;
