/** Headway: pipe-run head loss, rig friction data checks and review sheets. */
package org.headway;
