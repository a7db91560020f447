// The tool's version: shown in reports and part of every cache key, since a new
// version may measure differently.
export const TOOL_VERSION = '0.1.0';
