/**
 * Files: the sight log (CSV, one sight a row, see {@code docs/SIGHT-LOG.md}) and the passage
 * session file (JSON, see {@code docs/SESSION-FORMAT.md}).
 *
 * <p>Reading collects every bad cell with file, line and column and goes on with the good rows;
 * writing never damages the user's file (temporary file, then rename; the previous file kept as
 * {@code .bak}).
 */
package org.sightwork.celestial.io;
