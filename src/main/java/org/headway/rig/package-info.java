/**
 * Rig data: measured flow and pressure drop on a test pipe reduced to Re and f, with instrument
 * uncertainty carried to each point, the comparison with a friction correlation and the effective
 * roughness fit. Fluid properties come from {@code fluid}. Depends on {@code fluid},
 * {@code friction} and {@code caution}.
 */
package org.headway.rig;
