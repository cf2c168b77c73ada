package org.shutline.io;

import com.linuxense.javadbf.DBFCharsetHelper;
import com.linuxense.javadbf.DBFException;
import com.linuxense.javadbf.DBFReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.StandardCharsets;
import java.nio.charset.UnsupportedCharsetException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;

/**
 * Reads a shapefile's {@code .dbf} table with javadbf, after checking its header
 * against the file size (dBASE III+ layout: record count at byte 4, header length at
 * 8, record length at 10, little-endian; field descriptors of 32 bytes ended by
 * 0x0D). Text is decoded with the charset named by the {@code .cpg} file when there
 * is one, else by the language-driver byte (byte 29), else ISO-8859-1. Numbers come
 * back as {@code BigDecimal}, dates as {@code LocalDate}, logicals as Boolean.
 * Any inconsistency throws {@link InputException} naming the file (and record).
 */
final class DbfTable {
    /**
     * Field names in file order, one value array per record (deleted ones
     * included, so that rows stay aligned with the shapes), and which records
     * (0-based) carry dBASE's deletion mark '*'.
     */
    record Result(List<String> fields, List<Object[]> rows, BitSet deleted) {
        Result {
            deleted = (BitSet) deleted.clone();
        }

        boolean isDeleted(int row) {
            return deleted.get(row);
        }
    }

    private DbfTable() {}

    static Result read(Path dbf, Path cpg) throws InputException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(dbf);
        } catch (IOException e) {
            throw new InputException(dbf + ": cannot read: " + e.getMessage(), e);
        }
        checkHeader(bytes, dbf);
        return read(bytes, dbf, charset(bytes, dbf, cpg), cpg);
    }

    /**
     * Reads a {@code .dbf} already in memory ({@code dbf} names it in messages), text in
     * {@code cs}, or when null in the charset of its language-driver byte (else ISO-8859-1).
     */
    static Result read(byte[] bytes, Path dbf, Charset charset) throws InputException {
        return read(bytes, dbf, charset, null);
    }

    /** The same, {@code cpg} (may be null) naming the code-page file in messages. */
    static Result read(byte[] bytes, Path dbf, Charset charset, Path cpg) throws InputException {
        int count = checkHeader(bytes, dbf);
        Charset cs = charset != null ? charset : charset(bytes, dbf, null);
        if (cs.equals(StandardCharsets.UTF_8)) checkUtf8(bytes, count, dbf, cpg);
        List<String> names = new ArrayList<>();
        List<Object[]> rows = new ArrayList<>(count);
        int rec = 0;
        BitSet deleted = new BitSet();
        int headerLen = le16(bytes, 8);
        int recLen = le16(bytes, 10);
        for (int i = 0; i < count; i++) if (bytes[headerLen + i * recLen] == '*') deleted.set(i);
        try (DBFReader r = new DBFReader(new ByteArrayInputStream(bytes), cs, true)) {
            if (r.getRecordCount() != count) throw new InputException(dbf + ": corrupt header (record count)");
            // with showDeletedRows javadbf puts a pseudo-field "deleted" first; the descriptors in the file decide
            int skip = r.getFieldCount() - descriptors(bytes);
            if (skip < 0 || skip > 1) throw new InputException(dbf + ": corrupt header (field descriptors)");
            long widths = 1; // the deletion flag
            for (int i = skip; i < r.getFieldCount(); i++) {
                names.add(r.getField(i).getName());
                // javadbf takes a character field's decimal-count byte as the high byte of its length
                int len = r.getField(i).getLength();
                if (len < 1) throw new InputException(dbf + ": corrupt header: field " + r.getField(i).getName() + " has length " + len);
                widths += len;
            }
            if (widths != recLen) {
                throw new InputException(dbf + ": corrupt header: field lengths add up to " + widths + " bytes, the record length is " + recLen);
            }
            for (rec = 1; rec <= count; rec++) {
                Object[] row = r.nextRecord();
                if (row == null) throw new InputException(dbf + ": truncated: record " + rec + " of " + count + " missing");
                if (row.length != names.size() + skip) throw new InputException(dbf + ": corrupt record " + rec);
                rows.add(dates(Arrays.copyOfRange(row, skip, row.length)));
            }
        } catch (DBFException e) {
            throw new InputException(dbf + ": corrupt " + (rec == 0 ? "header" : "record " + rec) + ": " + e.getMessage(), e);
        } catch (java.nio.BufferUnderflowException | IndexOutOfBoundsException | NumberFormatException | ArithmeticException e) {
            // javadbf decoding a field of a width its type does not allow (a binary double of fewer than 8 bytes)
            throw new InputException(dbf + ": corrupt " + (rec == 0 ? "header" : "record " + rec) + ": a field cannot be decoded ("
                    + e.getClass().getSimpleName() + ")", e);
        }
        return new Result(names, rows, deleted);
    }

    /**
     * Dates as LocalDate: javadbf builds a {@code java.util.Date} in the default time
     * zone from the 8 digits yyyymmdd; the empty date "00000000" comes out before
     * year 1 and is read as null.
     */
    private static Object[] dates(Object[] row) {
        for (int i = 0; i < row.length; i++) {
            if (row[i] instanceof java.util.Date d) {
                java.time.LocalDate ld = d.toInstant().atZone(java.time.ZoneId.systemDefault()).toLocalDate();
                row[i] = ld.getYear() < 1 ? null : ld;
            }
        }
        return row;
    }

    /**
     * Text fields of a table whose .cpg says UTF-8 must be UTF-8: a latin-1 byte there
     * would come out as a replacement character inside an id, so the table is refused,
     * naming the record, the field and the byte.
     */
    private static void checkUtf8(byte[] b, int count, Path dbf, Path cpg) throws InputException {
        int headerLen = le16(b, 8);
        int recLen = le16(b, 10);
        java.nio.charset.CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(java.nio.charset.CodingErrorAction.REPORT)
                .onUnmappableCharacter(java.nio.charset.CodingErrorAction.REPORT);
        int offset = 1;
        for (int at = 32; at + 32 <= headerLen && b[at] != 0x0D; at += 32) {
            int len = b[at + 16] & 0xff;
            if (b[at + 11] == 'C') {
                for (int r = 0; r < count; r++) {
                    int start = headerLen + r * recLen + offset;
                    try {
                        dec.reset().decode(java.nio.ByteBuffer.wrap(b, start, len));
                    } catch (java.nio.charset.CharacterCodingException e) {
                        String name = new String(b, at, 11, StandardCharsets.US_ASCII).replace("\0", "").trim();
                        int bad = start;
                        while (bad < start + len && (b[bad] & 0x80) == 0) bad++;
                        throw new InputException(dbf + ": record " + (r + 1) + ", field " + name + ": not UTF-8 text (byte 0x"
                                + String.format("%02X", b[Math.min(bad, start + len - 1)] & 0xff) + ") although "
                                + (cpg == null ? "the header" : cpg.getFileName()) + " says UTF-8; the table is probably in another"
                                + " code page (latin-1?): correct the .cpg so ids are not read wrong");
                    }
                }
            }
            offset += len;
        }
    }

    /** Returns the record count after checking the header against the file size. */
    /** Number of 32-byte field descriptors before the 0x0D terminator (the header was checked). */
    private static int descriptors(byte[] b) {
        int n = 0;
        for (int at = 32; at < b.length && b[at] != 0x0D; at += 32) n++;
        return n;
    }

    private static int checkHeader(byte[] b, Path dbf) throws InputException {
        if (b.length < 33) throw new InputException(dbf + ": truncated: " + b.length + " bytes is shorter than a dBASE header");
        int version = b[0] & 0x07;
        if (version != 3 && version != 4) throw new InputException(dbf + ": not a dBASE file (version byte " + (b[0] & 0xff) + ")");
        long count = le32(b, 4) & 0xffffffffL;
        int headerLen = le16(b, 8);
        int recLen = le16(b, 10);
        if (headerLen < 33 || headerLen > b.length || recLen < 1) {
            throw new InputException(dbf + ": corrupt header (header length " + headerLen + ", record length " + recLen + ")");
        }
        boolean terminated = false;
        int widths = 1; // the deletion flag
        for (int at = 32; at < headerLen; at += 32) {
            if (b[at] == 0x0D) { terminated = true; break; }
            if (at + 32 > headerLen) break;
            widths += b[at + 16] & 0xff;
        }
        if (!terminated || widths != recLen) {
            throw new InputException(dbf + ": corrupt header (field descriptors do not match the record length)");
        }
        long need = headerLen + count * recLen;
        if (b.length < need) {
            throw new InputException(dbf + ": truncated: header promises " + count + " records (" + need
                    + " bytes), file has " + b.length + " bytes");
        }
        return (int) count;
    }

    private static Charset charset(byte[] b, Path dbf, Path cpg) throws InputException {
        if (cpg != null) {
            String name;
            try {
                name = Files.readString(cpg, StandardCharsets.US_ASCII).trim();
            } catch (IOException e) {
                throw new InputException(cpg + ": cannot read: " + e.getMessage(), e);
            }
            return cpgCharset(name, cpg);
        }
        int ldid = b[29] & 0xff;
        if (ldid != 0) {
            Charset c = DBFCharsetHelper.getCharsetByByte(ldid);
            if (c != null) return c;
        }
        return StandardCharsets.ISO_8859_1;
    }

    /** A .cpg code page name: a charset name, or a bare number meaning a Windows code page (88591 etc. for ISO 8859). */
    static Charset cpgCharset(String name, Path cpg) throws InputException {
        String n = name.toUpperCase(Locale.ROOT);
        try {
            if (n.matches("8859\\d+")) return Charset.forName("ISO-8859-" + n.substring(4));
            if (n.matches("\\d+")) return Charset.forName(n.length() == 3 ? "IBM" + n : "windows-" + n);
            if (n.equals("UTF8")) return StandardCharsets.UTF_8;
            return Charset.forName(name);
        } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
            throw new InputException(cpg + ": unknown code page '" + name + "'");
        }
    }

    private static int le16(byte[] b, int at) {
        return (b[at] & 0xff) | (b[at + 1] & 0xff) << 8;
    }

    private static int le32(byte[] b, int at) {
        return le16(b, at) | le16(b, at + 2) << 16;
    }
}
