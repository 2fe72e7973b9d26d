package org.streetcomb.read;

import java.nio.file.Path;

/** Reads the road lines of one file format into WGS84 longitude/latitude. */
public interface LayerReader {

    /**
     * @throws org.streetcomb.InputError when the file is missing, malformed or holds no road lines
     */
    RoadLayer read(Path file);
}
