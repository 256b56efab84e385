/**
 * The {@code headway} command line (picocli): thin commands that parse options, call the engines
 * and print text, CSV or JSON. Bad input maps to exit code 2 with one line on stderr.
 */
package org.headway.cli;
