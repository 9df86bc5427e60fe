/**
 * Reading and writing the user's files: one writer, {@link org.sightwork.geo.files.SafeWrite}, for
 * every file Sightwork writes on the user's behalf (settings, sessions, tracks, reports, drill packs,
 * images), and one CSV line splitter, {@link org.sightwork.geo.files.CsvLine}, for every CSV it reads
 * (RFC 4180 quoting, the column of each cell for the error messages).
 *
 * <p>The contract below is the writer's.
 *
 * <p><b>Contract.</b> A write
 * <ol>
 *   <li>fills a temporary file in the same directory as the target ({@code .NAME.<random>.tmp}),
 *       so that the final rename never crosses a file system;</li>
 *   <li>forces it to the disk ({@code FileChannel.force(true)}) before anything else happens;</li>
 *   <li>gives it the permissions of the file it replaces, or {@code rw-r--r--} (0644) for a new
 *       file, where the file system has POSIX permissions (a plain {@code Files.createTempFile}
 *       would leave 0600, unreadable to anyone else: a student pack handed out from a shared
 *       folder must be readable);</li>
 *   <li>when asked, keeps the previous version as {@code NAME.bak} (itself written through a
 *       temporary file and a rename, so the backup is never half a file either);</li>
 *   <li>renames the temporary file over the target with {@code ATOMIC_MOVE}. Only where the file
 *       system refuses an atomic move ({@link java.nio.file.AtomicMoveNotSupportedException}) does
 *       it fall back to a plain replace, and it says so with a warning on the
 *       {@code org.sightwork.geo.files} {@link java.lang.System.Logger}: a crash inside that
 *       replace could then leave the target missing, though never half-written (the complete new
 *       file and, when asked, the {@code .bak} are on disk first);</li>
 *   <li>then forces the directory too, where the platform can (Linux can; elsewhere this step is
 *       skipped), so that the rename itself survives a power cut;</li>
 *   <li>on any failure (the content's own, the disk's, the rename's) deletes the temporary file and
 *       leaves the target, and its {@code .bak}, as they were.</li>
 * </ol>
 *
 * <p><b>Limits.</b> The directory must exist (callers that may make it say so and make it). A
 * target that is a symbolic link is replaced by a regular file; the link's target is not written.
 * Two writers of the same target at the same time each write a whole file: the last rename wins.
 * Owner, group and ACLs other than the POSIX permission bits are not carried over.
 */
package org.sightwork.geo.files;
