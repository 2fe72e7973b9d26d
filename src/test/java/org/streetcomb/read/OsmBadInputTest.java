package org.streetcomb.read;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Broken or hostile OpenStreetMap files are refused with one line naming the file, exit code 3 and no
 * output. XML with a DOCTYPE is refused so no external entity is ever resolved (OWASP XML External
 * Entity Prevention Cheat Sheet: disable DTDs).
 */
class OsmBadInputTest {

    @TempDir
    Path dir;

    @Test
    void doctypeWithAnExternalEntityIsRefusedUnread() throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "do-not-read");
        Path osm = dir.resolve("hostile.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<!DOCTYPE osm [<!ENTITY leak SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<osm version=\"0.6\"><way id=\"1\"><nd ref=\"1\"/><nd ref=\"2\"/><tag k=\"highway\" v=\"residential\"/>"
                + "<tag k=\"name\" v=\"&leak;\"/></way></osm>\n");
        Refusals.assertRefused(dir, osm, "hostile.osm: line 2: a DOCTYPE declaration is not allowed");
    }

    @Test
    void internalEntityExpansionIsRefused() throws IOException {
        Path osm = dir.resolve("expansion.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<!DOCTYPE osm [<!ENTITY a \"aaaaaaaaaa\"><!ENTITY b \"&a;&a;&a;&a;\">]>\n"
                + "<osm version=\"0.6\"><node id=\"1\" lat=\"0\" lon=\"0\"><tag k=\"x\" v=\"&b;\"/></node></osm>\n");
        Refusals.assertRefused(dir, osm, "expansion.osm: line 2: a DOCTYPE declaration is not allowed");
    }

    @Test
    void truncatedPbf() throws IOException {
        byte[] bytes = Files.readAllBytes(Path.of("fixtures/osm/aguascalientes.osm.pbf"));
        Path pbf = dir.resolve("cut.osm.pbf");
        Files.write(pbf, Arrays.copyOf(bytes, bytes.length / 2));
        Refusals.assertRefused(dir, pbf, "truncated: the file ends inside a block");
    }

    /** The first block (the OSMHeader) of a real file, then a crafted block, as the PBF format frames them. */
    private Path pbfWith(String name, crosby.binary.Fileformat.BlobHeader.Builder header, crosby.binary.Fileformat.Blob blob)
            throws IOException {
        byte[] bytes = Files.readAllBytes(Path.of("fixtures/osm/aguascalientes.osm.pbf"));
        int first = 4 + java.nio.ByteBuffer.wrap(bytes).getInt();
        int firstBlock = first + crosby.binary.Fileformat.BlobHeader.parseFrom(Arrays.copyOfRange(bytes, 4, first)).getDatasize();
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        out.write(bytes, 0, firstBlock);
        byte[] head = header.setDatasize(header.hasDatasize() ? header.getDatasize() : blob.getSerializedSize()).build().toByteArray();
        out.write(java.nio.ByteBuffer.allocate(4).putInt(head.length).array());
        out.write(head);
        out.write(blob.toByteArray());
        Path pbf = dir.resolve(name);
        Files.write(pbf, out.toByteArray());
        return pbf;
    }

    @Test
    void pbfBlockClaimingTwoGigabytesIsRefusedWithoutAllocating() throws IOException {
        // The PBF format caps a block at 32 MiB unpacked (https://wiki.openstreetmap.org/wiki/PBF_Format);
        // osmpbf allocated the claimed raw size first: 4 GB of heap for a 55 KB file, then an exception name
        crosby.binary.Fileformat.Blob blob = crosby.binary.Fileformat.Blob.newBuilder().setRawSize(Integer.MAX_VALUE)
                .setZlibData(com.google.protobuf.ByteString.copyFrom(new byte[] {0x78, (byte) 0x9c, 3, 0, 0, 0, 0, 1})).build();
        Path pbf = pbfWith("bomb.osm.pbf", crosby.binary.Fileformat.BlobHeader.newBuilder().setType("OSMData"), blob);
        Refusals.assertRefused(dir, pbf, "bomb.osm.pbf: block 2 at byte");
        Refusals.assertRefused(dir, pbf, "the block claims to hold 2147483647 bytes; the PBF format allows at most 33554432");
    }

    @Test
    void pbfBlockHeaderClaimingTooMuch() throws IOException {
        crosby.binary.Fileformat.Blob blob = crosby.binary.Fileformat.Blob.newBuilder()
                .setRaw(com.google.protobuf.ByteString.copyFrom(new byte[10])).build();
        Path pbf = pbfWith("big.osm.pbf", crosby.binary.Fileformat.BlobHeader.newBuilder().setType("OSMData")
                .setDatasize(1 << 30), blob);
        Refusals.assertRefused(dir, pbf, "big.osm.pbf: block 2 at byte");
        Refusals.assertRefused(dir, pbf, "the block claims 1073741824 bytes; the PBF format allows at most 33554432");
    }

    @Test
    void notAnOsmFile() throws IOException {
        Path osm = dir.resolve("wrong.osm");
        Files.writeString(osm, "<?xml version=\"1.0\"?>\n<gpx version=\"1.1\"></gpx>\n");
        Refusals.assertRefused(dir, osm, "wrong.osm: line 2: root element <gpx> is not <osm>");
        assertFalse(Files.exists(dir.resolve("tour.geojson")));
    }

    @Test
    void truncatedXml() throws IOException {
        Path osm = dir.resolve("cut.osm");
        String text = Files.readString(Path.of("fixtures/osm/bavaria-rural.osm"));
        Files.writeString(osm, text.substring(0, text.length() / 2));
        Refusals.assertRefused(dir, osm, "cut.osm: line ");
    }
}
