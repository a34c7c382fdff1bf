package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;

/** The exact one-line message of every kind of bad input, as the researcher reads it. */
class ReadErrorMessagesTest {
    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        return LoadErrors.write(dir, name, text);
    }

    private static String error(Path arg) {
        return LoadErrors.message(arg, BadInputException.class);
    }

    @Test
    void duplicateChannelInHeaderNamesBothColumns() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\tCz\tcz\n0\t1\t2\t3\n4\t1\t2\t3\n");
        assertThat(error(f)).isEqualTo(f + " line 1 column 4: channel cz appears twice in the"
                + " header (also column 3)");
    }

    @Test
    void duplicateChannelRowNamesBothLines() throws IOException {
        Path f = file("a.tsv", "channel,0,4\nFz,1,2\nCz,1,2\nFz,3,4\n");
        assertThat(error(f)).isEqualTo(f + " line 4 column 1: channel Fz appears twice (also on"
                + " line 2)");
    }

    @Test
    void nonNumericCellIsQuoted() throws IOException {
        Path f = file("a.tsv", "# unit: uV\ntime_ms\tFz\tCz\n0\t1\t2\n4\t1.2.3\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 4 column 2: \"1.2.3\" is not a number");
    }

    @Test
    void decimalCommaGetsAHint() throws IOException {
        Path f = file("a.csv", "time_ms;Fz\n0;1\n4;2,5\n");
        assertThat(error(f)).isEqualTo(f + " line 3 column 2: \"2,5\" is not a number (the decimal"
                + " mark must be a point)");
    }

    @Test
    void typeSuffixOfTheJavaSyntaxIsNotANumber() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1.5f\n4\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 2: \"1.5f\" is not a number");
    }

    @Test
    void emptyCellIsNamed() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\tCz\n0\t\t2\n4\t1\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 2: empty cell where a number is"
                + " expected");
    }

    @Test
    void notANumberIsRefused() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\tNaN\n4\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 2: \"NaN\" is not a finite number (NaN"
                + " and infinite values are not allowed)");
    }

    @Test
    void infinityIsRefused() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1\n4\t-Inf\n");
        assertThat(error(f)).isEqualTo(f + " line 3 column 2: \"-Inf\" is not a finite number (NaN"
                + " and infinite values are not allowed)");
    }

    @Test
    void overflowIsOutOfRange() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1e999\n4\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 2: \"1e999\" is out of range");
    }

    @Test
    void shortRowNamesTheMissingCell() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\tCz\n0\t1\t2\n4\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 3 column 3: the row has 2 cells but the header"
                + " has 3 (missing cell)");
    }

    @Test
    void longRowNamesTheExtraCell() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\tCz\n0\t1\t2\t3\t4\n4\t1\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 4: the row has 5 cells but the header"
                + " has 3 (extra cells)");
    }

    @Test
    void nonUniformSamplingNamesTheRow() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1\n4\t1\n8\t1\n13\t1\n17\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 5 column 1: sampling is not uniform: time 13 ms"
                + " is 5 ms after the previous sample, but the median step is 4 ms (allowed:"
                + " within 0.1 %)");
    }

    @Test
    void nonUniformTimesInAHeaderNameTheColumn() throws IOException {
        Path f = file("a.tsv", "channel\t0\t2\t4\t7\t8\nCz\t1\t1\t1\t1\t1\n");
        assertThat(error(f)).startsWith(f + " line 1 column 5: sampling is not uniform: time 7 ms");
    }

    @Test
    void decreasingTimesAreNamed() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1\n4\t1\n4\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 4 column 1: time 4 ms does not come after 4 ms;"
                + " times must increase");
    }

    @Test
    void oneSampleHasNoRate() throws IOException {
        Path f = file("a.tsv", "time_ms\tFz\n0\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 2 column 1: only one sample: at least two are"
                + " needed to know the sampling rate");
    }

    @Test
    void emptyFile() throws IOException {
        Path f = file("a.tsv", "");
        assertThat(error(f)).isEqualTo(f + ": the file is empty");
    }

    @Test
    void onlyComments() throws IOException {
        Path f = file("a.tsv", "# unit: uV\n\n# nothing else\n");
        assertThat(error(f)).isEqualTo(f + ": has only comment lines, no header");
    }

    @Test
    void headerOnly() throws IOException {
        Path f = file("a.tsv", "# unit: mV\ntime_ms,Fz,Cz\r\n\r\n");
        assertThat(error(f)).isEqualTo(f + " line 2: a header but no data rows");
    }

    @Test
    void unknownUnit() throws IOException {
        Path f = file("a.tsv", "# unit: mmV\ntime_ms\tFz\n0\t1\n4\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 1: unknown unit \"mmV\" (expected V, mV, uV or"
                + " µV, nV, or uV/m2 for CSD)");
    }

    @Test
    void singleColumnHeader() throws IOException {
        Path f = file("a.tsv", "time_ms Fz Cz\n0 1 2\n");
        assertThat(error(f)).isEqualTo(f + " line 1: the header has a single column; separate the"
                + " columns by tabs, commas or semicolons");
    }

    @Test
    void unknownHeader() throws IOException {
        Path f = file("a.tsv", "ms\tFz\n0\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 1 column 1: cannot tell what this file is: the"
                + " header starts with \"ms\"; expected time_ms, time_s or channel (a waveform"
                + " file), or the columns participant, condition and file (a study manifest) or"
                + " participant, condition, channel, time_ms and value (a long table)");
    }

    @Test
    void montageFileIsNotAStudy() throws IOException {
        Path f = file("montage.tsv", "label\tx\ty\tz\nCz\t0\t0\t1\n");
        assertThat(error(f)).isEqualTo(f + " line 1: this is a montage file, not a study (a"
                + " montage is used when it lies beside the manifest as montage.tsv)");
    }

    @Test
    void missingPath() {
        Path f = dir.resolve("nothing.tsv");
        assertThat(error(f)).isEqualTo(f + ": file or folder does not exist");
    }

    @Test
    void folderWithoutManifest() {
        assertThat(error(dir)).isEqualTo(dir + ": the folder has no study.tsv");
    }

    @Test
    void missingFileNamesTheManifestRow() throws IOException {
        file("data/p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        Path m = file("study.tsv", "participant\tcondition\tfile\np01\trare\tdata/p01.tsv\n"
                + "p02\trare\tdata/p02.tsv\n");
        assertThat(error(m)).isEqualTo(m + " line 3 column 3: file " + dir.resolve("data/p02.tsv")
                + " does not exist");
    }

    @Test
    void differentChannelSetsNameBothFiles() throws IOException {
        file("p01.tsv", "time_ms\tCz\tPz\n0\t1\t1\n4\t2\t2\n");
        file("p02.tsv", "time_ms\tCz\tOz\n0\t1\t1\n4\t2\t2\n");
        file("study.tsv", "participant\tcondition\tfile\np01\trare\tp01.tsv\np02\trare\tp02.tsv\n");
        assertThat(error(dir)).isEqualTo(dir + ": " + dir.resolve("p01.tsv") + " (participant p01,"
                + " condition rare) and " + dir.resolve("p02.tsv") + " (participant p02, condition"
                + " rare) have different channels: second lacks Pz; second adds Oz");
    }

    @Test
    void differentTimeAxesNameBothFilesAndTheDifference() throws IOException {
        file("p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        file("p02.tsv", "time_ms\tCz\n0\t1\n2\t2\n");
        file("study.tsv", "participant\tcondition\tfile\np01\trare\tp01.tsv\np01\tcommon\tp02.tsv\n");
        assertThat(error(dir)).isEqualTo(dir + ": " + dir.resolve("p01.tsv") + " (participant p01,"
                + " condition rare) and " + dir.resolve("p02.tsv") + " (participant p01, condition"
                + " common) have different time axes: 250 Hz vs 500 Hz");
    }

    @Test
    void differentUnitsNameBothFiles() throws IOException {
        file("p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        file("p02.tsv", "# unit: uV/m2\ntime_ms\tCz\n0\t1\n4\t2\n");
        file("study.tsv", "participant\tcondition\tfile\np01\trare\tp01.tsv\np02\trare\tp02.tsv\n");
        assertThat(error(dir)).isEqualTo(dir + ": " + dir.resolve("p01.tsv") + " (participant p01,"
                + " condition rare) and " + dir.resolve("p02.tsv") + " (participant p02, condition"
                + " rare) have different units: µV vs µV/m²");
    }

    @Test
    void manifestRowGivenTwice() throws IOException {
        file("p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        Path m = file("study.tsv", "participant,condition,file\np01,rare,p01.tsv\nP01,Rare,p01.tsv\n");
        assertThat(error(m)).isEqualTo(m + " line 3: participant P01, condition Rare is listed"
                + " twice (also on line 2)");
    }

    @Test
    void manifestTrialsMustBeAWholeNumber() throws IOException {
        file("p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        Path m = file("study.tsv", "participant\tcondition\tfile\ttrials\np01\trare\tp01.tsv\t4.5\n");
        assertThat(error(m)).isEqualTo(m + " line 2 column 4: trials must be a whole number of at"
                + " least 0, not \"4.5\"");
    }

    @Test
    void manifestWithoutRows() throws IOException {
        Path m = file("study.tsv", "participant\tcondition\tfile\n");
        assertThat(error(m)).isEqualTo(m + " line 1: a header but no rows: the manifest lists no"
                + " waveform files");
    }

    @Test
    void manifestEmptyParticipant() throws IOException {
        file("p01.tsv", "time_ms\tCz\n0\t1\n4\t2\n");
        Path m = file("study.tsv", "participant\tcondition\tfile\n\trare\tp01.tsv\n");
        assertThat(error(m)).isEqualTo(m + " line 2 column 1: empty participant");
    }

    @Test
    void sameStandardPositionTwiceNamesTheFile() throws IOException {
        Path f = file("a.tsv", "time_ms\tT3\tT7\n0\t1\t1\n4\t2\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 1 columns 2 and 3: channels T3 and T7 take the same"
                + " position (from standard 10-5 positions); keep one of them or give positions in a"
                + " montage.tsv beside the data");
        Path rows = file("b.tsv", "# unit: uV\nchannel\t0\t4\nT3\t1\t1\nCz\t1\t1\nt7\t2\t2\n");
        assertThat(error(rows)).startsWith(rows + " lines 3 and 5 column 1: channels T3 and t7 take the same");
    }

    @Test
    void longTableValueGivenTwiceNamesBothLines() throws IOException {
        Path f = file("long.tsv", "participant\tcondition\tchannel\ttime_ms\tvalue\n"
                + "p01\trare\tCz\t0\t1\np01\trare\tCz\t4\t1\np01\trare\tCz\t0\t2\n");
        assertThat(error(f)).isEqualTo(f + " line 4: participant p01, condition rare, channel Cz"
                + " at 0 ms is given twice (also on line 2)");
    }

    @Test
    void longTableCellsWithDifferentChannelsNameBothCells() throws IOException {
        Path f = file("long.tsv", "participant\tcondition\tchannel\ttime_ms\tvalue\n"
                + "p01\trare\tCz\t0\t1\np01\trare\tCz\t4\t1\np01\trare\tPz\t0\t1\np01\trare\tPz\t4\t1\n"
                + "p02\trare\tCz\t0\t1\np02\trare\tCz\t4\t1\n");
        assertThat(error(f)).isEqualTo(f + ": participant p02, condition rare has no rows for"
                + " channel Pz, which participant p01, condition rare has (the cells have different"
                + " channel sets)");
    }

    @Test
    void longTableMissingCell() throws IOException {
        Path f = file("long.tsv", "participant\tcondition\tchannel\ttime_ms\tvalue\n"
                + "p01\trare\tCz\t0\t1\np01\trare\tCz\t4\t1\np02\tcommon\tCz\t0\t1\n"
                + "p02\tcommon\tCz\t4\t1\n");
        assertThat(error(f)).isEqualTo(f + ": no rows for participant p01, condition common");
    }

    @Test
    void longTableMissingSingleValue() throws IOException {
        Path f = file("long.tsv", "participant\tcondition\tchannel\ttime_ms\tvalue\n"
                + "p01\trare\tCz\t0\t1\np01\trare\tCz\t4\t1\np01\trare\tPz\t0\t1\n"
                + "p01\trare\tPz\t8\t1\np01\trare\tCz\t8\t1\n");
        assertThat(error(f)).isEqualTo(f + ": no value for participant p01, condition rare,"
                + " channel Pz at 4 ms");
    }

    @Test
    void binaryFileIsNotATable() throws IOException {
        Path f = dir.resolve("image.tsv");
        Files.write(f, new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, '\n', 1, 2});
        assertThat(error(f)).isEqualTo(f + " line 1: this is not a text table (it holds binary"
                + " data)");
    }

    @Test
    void truncatedCompressedFileIsNamed() throws IOException {
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        try (java.util.zip.GZIPOutputStream gz = new java.util.zip.GZIPOutputStream(bytes)) {
            gz.write("time_ms\tCz\n0\t1\n4\t2\n8\t3\n".getBytes(StandardCharsets.UTF_8));
        }
        Path f = dir.resolve("cut.tsv.gz");
        Files.write(f, java.util.Arrays.copyOf(bytes.toByteArray(), 25));
        assertThat(error(f)).endsWith(": the compressed data is damaged or cut short");
    }
}
