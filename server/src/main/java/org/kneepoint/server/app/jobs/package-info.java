/**
 * Background jobs of one running application: one worker, a bounded queue, random ids, progress as a fraction and
 * a stage in words, finished jobs kept for a bounded time and count.
 */
package org.kneepoint.server.app.jobs;
