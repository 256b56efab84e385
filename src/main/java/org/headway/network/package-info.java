/**
 * Branched and looped networks: junctions, fixed-head boundaries and a pressure reference, links
 * that are the system elements (pipes, valves, rated components, check and isolation valves,
 * pumps), solved by the global gradient algorithm of Todini &amp; Pilati (1988) with the exact
 * Jacobian of every element's law.
 *
 * <p>Depends on {@code system} (the elements and their laws), {@code fluid} and {@code caution};
 * nothing here depends on the CLI, the app or the report.
 */
package org.headway.network;
