/**
 * Quantities as people type them ({@code 150 mm}, {@code 12 L/s}, {@code 20 degC}) parsed to SI
 * doubles, and SI doubles formatted in a chosen unit system. Used only at the edges.
 */
package org.headway.units;
