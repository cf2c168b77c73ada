/**
 * Readers and writers: GeoPackage and shapefile networks, the field-mapping file,
 * CRS handling and re-projection. Input files are opened read-only and never
 * modified; files Shutline writes go to a temporary file that is moved into place.
 * No Swing or AWT.
 *
 * <p>Read side: {@link org.shutline.io.NetworkReader#read} is the entry point. A
 * source ({@code ShapefileSource}: {@code ShpReader} for {@code .shp}/{@code .shx},
 * {@code DbfTable} for {@code .dbf}; or {@code GeoPackageSource}) gives raw layers;
 * {@code CrsResolver} brings them into the mains' projected CRS; {@code LayerDecoder}
 * applies the data model and the {@link org.shutline.io.FieldMapping}, turning bad
 * data into findings. {@link org.shutline.io.Crs} is the public CRS utility (EPSG
 * codes, {@code .prj} WKT, UTM zones, transforms to longitude/latitude). The layers,
 * fields, defaults and finding codes are described in docs/input-data.md.
 */
package org.shutline.io;
