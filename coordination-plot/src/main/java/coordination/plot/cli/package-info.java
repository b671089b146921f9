/**
 * The {@code coordination} command line: {@code sheet}, {@code check}, {@code withstand} and {@code design}, one class per subcommand, writing to injected streams. Exit codes:
 * {@link coordination.plot.cli.ExitCodes}.
 */
package coordination.plot.cli;
