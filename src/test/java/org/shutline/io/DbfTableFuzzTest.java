package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.shutline.fuzz.Bounded;

/**
 * Fuzzes the {@code .dbf} reader ({@link DbfTable}), text decoded by the charset of the
 * file's language-driver byte as when there is no {@code .cpg}. The reader documents
 * {@link InputException} naming the file for anything it cannot read; any other
 * exception (from the reader or from javadbf under it), a message without the file
 * name, or an input past {@link Bounded#LIMIT_SECONDS} is a finding. A table it reads
 * has as many rows as its header's record count (dBASE III+ header, bytes 4-7) and
 * every row one value per field. Seeds: {@code DbfTableFuzzTestInputs/table}, cut from
 * the sample town's {@code .dbf} files by {@code FuzzSeeds}.
 */
class DbfTableFuzzTest {
    static final Path DBF = Path.of("fuzz.dbf");

    @FuzzTest(maxDuration = "2m")
    void table(byte[] data) {
        Throwable t = Bounded.run(() -> {
            DbfTable.Result r = DbfTable.read(data, DBF, null);
            long count = (data[4] & 0xffL) | (data[5] & 0xffL) << 8 | (data[6] & 0xffL) << 16 | (data[7] & 0xffL) << 24;
            assertThat((long) r.rows().size()).isEqualTo(count);
            for (Object[] row : r.rows()) assertThat(row).hasSize(r.fields().size());
        }, InputException.class);
        if (t != null) assertThat(t.getMessage()).contains("fuzz.dbf");
    }
}
