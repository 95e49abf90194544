package limen.ui.booth.tests;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/** A tiny lab for the booth tests: one 2AFC step, one 2-down/1-up track, short sounds. */
final class DemoLab {

    static final String BATTERY = "booth-demo.battery";

    /** Frequency discrimination at 1 kHz; stops after 6 reversals or 30 trials. */
    static final String BATTERY_XML = """
            <?xml version="1.0" encoding="UTF-8"?>
            <limen:Battery xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xmlns:limen="http://limen.dev/model/1.0" schemaVersion="1" title="Harbourside booth demo: one short frequency-discrimination track" calibrationFile="harbourside-demo.calibration" ordering="FIXED">
              <steps id="fd-1000-short" title="Frequency discrimination 1000 Hz (short)">
                <task xsi:type="limen:ForcedChoiceTask" intervalDurationSeconds="0.25" interTrialIntervalSeconds="0.1" feedback="true" intervalCount="2" interStimulusIntervalSeconds="0.15"/>
                <stimulus standardFrequencyHz="1000.0" rampDurationSeconds="0.02">
                  <standardLevel xsi:type="limen:AbsoluteLevel" levelDbSpl="60.0"/>
                </stimulus>
                <variedQuantity unit="PERCENT" scale="LOG"/>
                <tracks name="A">
                  <procedure xsi:type="limen:TransformedUpDownProcedure" startValue="8.0" floorValue="0.05" ceilingValue="20.0" stepMode="MULTIPLICATIVE" downCount="2" upCount="1" initialStep="2.0" minimumStep="1.189" shrinkFactor="0.5" reversalsPerShrink="2" discardedReversals="2"/>
                  <stoppingRule maximumReversals="6" maximumTrials="30"/>
                </tracks>
              </steps>
            </limen:Battery>
            """;

    static final String TWO_PARTS = "booth-two-parts.battery";

    /** Two steps of three trials each with a break between them (minimum 1 s). */
    static final String TWO_PARTS_XML = """
            <?xml version="1.0" encoding="UTF-8"?>
            <limen:Battery xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xmlns:limen="http://limen.dev/model/1.0" schemaVersion="1" title="Harbourside booth demo: two short parts with a break" calibrationFile="harbourside-demo.calibration" ordering="FIXED">
              <steps id="fd-500-tiny" title="Frequency discrimination 500 Hz (three trials)">
                <task xsi:type="limen:ForcedChoiceTask" intervalDurationSeconds="0.2" interTrialIntervalSeconds="0.1" feedback="false" intervalCount="2" interStimulusIntervalSeconds="0.1"/>
                <stimulus standardFrequencyHz="500.0" rampDurationSeconds="0.02">
                  <standardLevel xsi:type="limen:AbsoluteLevel" levelDbSpl="60.0"/>
                </stimulus>
                <variedQuantity unit="PERCENT" scale="LOG"/>
                <tracks name="A">
                  <procedure xsi:type="limen:TransformedUpDownProcedure" startValue="8.0" floorValue="0.05" ceilingValue="20.0" stepMode="MULTIPLICATIVE" downCount="2" upCount="1" initialStep="2.0" minimumStep="1.189" shrinkFactor="0.5" reversalsPerShrink="2" discardedReversals="2"/>
                  <stoppingRule maximumReversals="20" maximumTrials="3"/>
                </tracks>
              </steps>
              <steps id="fd-2000-tiny" title="Frequency discrimination 2000 Hz (three trials)">
                <task xsi:type="limen:ForcedChoiceTask" intervalDurationSeconds="0.2" interTrialIntervalSeconds="0.1" feedback="false" intervalCount="2" interStimulusIntervalSeconds="0.1"/>
                <stimulus standardFrequencyHz="2000.0" rampDurationSeconds="0.02">
                  <standardLevel xsi:type="limen:AbsoluteLevel" levelDbSpl="60.0"/>
                </stimulus>
                <variedQuantity unit="PERCENT" scale="LOG"/>
                <tracks name="A">
                  <procedure xsi:type="limen:TransformedUpDownProcedure" startValue="8.0" floorValue="0.05" ceilingValue="20.0" stepMode="MULTIPLICATIVE" downCount="2" upCount="1" initialStep="2.0" minimumStep="1.189" shrinkFactor="0.5" reversalsPerShrink="2" discardedReversals="2"/>
                  <stoppingRule maximumReversals="20" maximumTrials="3"/>
                </tracks>
              </steps>
              <breaks afterStepCount="1" minimumDurationSeconds="1.0" message="Time for a short rest."/>
            </limen:Battery>
            """;

    static final String EARLY = "booth-early.battery";
    /** The same step without the attribute: early responses ignored (the default). */
    static final String IGNORING = "booth-early-ignored.battery";

    /** Three 2AFC trials with long intervals whose step takes early responses and records them as early. */
    static final String EARLY_XML = """
            <?xml version="1.0" encoding="UTF-8"?>
            <limen:Battery xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xmlns:limen="http://limen.dev/model/1.0" schemaVersion="1" title="Harbourside booth demo: early answers are recorded" calibrationFile="harbourside-demo.calibration" ordering="FIXED">
              <steps id="fd-1000-early" title="Frequency discrimination 1000 Hz (three trials, early answers taken)">
                <task xsi:type="limen:ForcedChoiceTask" intervalDurationSeconds="0.4" interTrialIntervalSeconds="0.1" feedback="false" earlyResponses="RECORD" intervalCount="2" interStimulusIntervalSeconds="0.3"/>
                <stimulus standardFrequencyHz="1000.0" rampDurationSeconds="0.02">
                  <standardLevel xsi:type="limen:AbsoluteLevel" levelDbSpl="60.0"/>
                </stimulus>
                <variedQuantity unit="PERCENT" scale="LOG"/>
                <tracks name="A">
                  <procedure xsi:type="limen:TransformedUpDownProcedure" startValue="8.0" floorValue="0.05" ceilingValue="20.0" stepMode="MULTIPLICATIVE" downCount="2" upCount="1" initialStep="2.0" minimumStep="1.189" shrinkFactor="0.5" reversalsPerShrink="2" discardedReversals="2"/>
                  <stoppingRule maximumReversals="20" maximumTrials="3"/>
                </tracks>
              </steps>
            </limen:Battery>
            """;

    private DemoLab() {
    }

    /** Writes the battery and the demo calibration (from {@code limen.root}/examples) into a workspace folder. */
    static Path write(Path workspace) throws Exception {
        Files.createDirectories(workspace);
        Path battery = workspace.resolve(BATTERY);
        Files.writeString(battery, BATTERY_XML.strip() + "\n");
        Files.writeString(workspace.resolve(TWO_PARTS), TWO_PARTS_XML.strip() + "\n");
        Files.writeString(workspace.resolve(EARLY), EARLY_XML.strip() + "\n");
        Files.writeString(workspace.resolve(IGNORING), EARLY_XML.strip().replace(" earlyResponses=\"RECORD\"", "")
                .replace("early answers are recorded", "early answers are ignored").replace("early answers taken", "early answers ignored") + "\n");
        Path root = Paths.get(System.getProperty("limen.root", "../.."));
        Path cal = root.resolve("examples/harbourside-demo.calibration");
        if (!Files.isRegularFile(cal)) {
            cal = Paths.get("../../examples/harbourside-demo.calibration");
        }
        Files.copy(cal, workspace.resolve("harbourside-demo.calibration"));
        return battery;
    }
}
