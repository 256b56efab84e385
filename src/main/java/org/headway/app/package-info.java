/**
 * The JavaFX desktop application. View-models (plain Java with JavaFX properties, no scene-graph
 * types) hold state and validation and call the engines; views only build controls and bind to
 * them. Dialogs and background scheduling go through interfaces so view-models test without the
 * toolkit.
 */
package org.headway.app;
