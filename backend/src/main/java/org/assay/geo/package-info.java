/**
 * Shared geometry kernel: streaming GeoJSON reading and validation, WKB coding, geodesic
 * measures on the WGS84 ellipsoid. Plain Java with JTS and GeographicLib, no Spring
 * types.
 */
@org.springframework.modulith.ApplicationModule(type = org.springframework.modulith.ApplicationModule.Type.OPEN)
package org.assay.geo;
