package org.feedernote.input;

/**
 * POI logs through the Log4j API (and commons-logging, which PDFBox uses, finds it once POI is on
 * the class path); without a logging back end the API prints a complaint on
 * standard error at first use. feedernote reports its own errors: the API's simple logger, set to
 * say nothing, is chosen before POI is first touched (unless the user chose otherwise).
 */
public final class PoiLogging {
    private PoiLogging() {}

    public static void quiet() {
        if (System.getProperty("log4j2.loggerContextFactory") == null && System.getProperty("log4j.provider") == null) {
            System.setProperty("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
            System.setProperty("org.apache.logging.log4j.simplelog.level", "OFF");
            System.setProperty("log4j2.simplelogLevel", "OFF");
        }
    }
}
