/**
 * Readers and writers: GeoPackage and shapefile networks, the field-mapping file,
 * CRS handling and re-projection. Input files are opened read-only and never
 * modified; files Shutline writes go to a temporary file that is moved into place.
 * No Swing or AWT.
 */
package org.shutline.io;
