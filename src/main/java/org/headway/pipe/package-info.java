/**
 * Pipe materials and roughness, nominal sizes and schedules, fittings and their loss-coefficient
 * methods, loaded from the catalog files in {@code fluids-data/}.
 *
 * <p>{@link org.headway.pipe.Catalog} validates and serves the files (bundled, or with a user's
 * folder laid over them); {@link org.headway.pipe.Weisbach1845FixedK}, {@link org.headway.pipe.Hooper1981TwoK} and
 * {@link org.headway.pipe.Darby2001ThreeK} are the fitting methods; {@link org.headway.pipe.Transitions}
 * gives losses of diameter changes. Quantities are SI; the files are in mm.
 */
package org.headway.pipe;
