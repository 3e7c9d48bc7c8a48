/**
 * Synthetic imagery of the demo island: 256 x 256 PNG tiles on the WebMercatorQuad grid
 * (OGC 17-083r2) at zoom 12 to 19, drawn from the demo's true world with java.awt
 * (fields, tracks and paved roads, roofs, tree cover that hides the roads beneath it),
 * cached on disk and served to signed-in people when the demo is enabled.
 */
package org.assay.imagery;
