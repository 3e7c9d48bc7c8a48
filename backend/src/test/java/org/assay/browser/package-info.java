/**
 * Tests in a real headless Chromium against the real server: the pages, their scripts and
 * the API together.
 */
package org.assay.browser;
