package org.lodestep.report.html;

import java.nio.file.Path;

/** Writes the sample reports to a folder, for looking at them by eye while developing. */
final class SampleWriterMain {
    private SampleWriterMain() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args.length > 0 ? args[0] : "target/sample-reports");
        SampleReports.everything("Tech <A&B>").write(dir.resolve("everything.html"));
        HtmlReport.builder("Wiring", "All connections")
                .figure(SampleReports.eightLeadSeries().toSvg(), "8 series")
                .figure(SampleReports.eightLeadParallel().toSvg(), "8 parallel")
                .figure(SampleReports.fiveLeadUnipolar().toSvg(), "5 unipolar")
                .build().write(dir.resolve("wiring.html"));
        SampleReports.responseCurve().writePng(dir.resolve("response.png"), 1);
    }
}
