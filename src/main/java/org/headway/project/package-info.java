/**
 * Files the user keeps between sessions, in JSON: for now the fitted-correlation file. Reading is
 * strict (unknown keys are errors, messages name the JSON path); writing goes to a temporary file
 * in the same folder and is moved into place atomically.
 */
package org.headway.project;
