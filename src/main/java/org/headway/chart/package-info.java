/**
 * JFreeChart builders shared by the desktop app and the head-loss sheet: the friction chart (f
 * against Re for chosen relative roughness, with operating points, rig data and fitted
 * correlations), the system/pump curve chart and the grade-line chart. No JavaFX here.
 */
package org.headway.chart;
