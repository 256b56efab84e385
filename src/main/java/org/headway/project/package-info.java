/**
 * Files the engineer keeps between sessions, all JSON of our own schemas: the project file
 * ({@link org.headway.project.ProjectFile}, resolved to a pipe run by {@link
 * org.headway.project.ProjectResolver}), the fitted-correlation file and the rig file with its
 * streamed CSV. Reading is strict (unknown keys are errors, messages name the JSON path); writing
 * goes to a temporary file in the same folder and is moved into place atomically.
 */
package org.headway.project;
