/**
 * The vehicle file (shared spec files.md, version 1): reading with validation of every key (all problems at
 * once, each naming its key path, the value and the allowed range), the open document as a JSON tree that
 * keeps unknown keys, and atomic saving. Files use the units their key names say; records hold SI.
 */
package barwright.io;
