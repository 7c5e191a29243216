/** The command line: one class per command, registered in {@link barwright.cli.Cli}. */
package barwright.cli;
