package limen.audio;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import javax.sound.sampled.Mixer;

import org.junit.jupiter.api.Test;

/** Device listing and choice, and the plain message when there is nothing to play on. */
class DevicesTest {

    private final Mixer.Info dflt = FakeSound.info("default [default]", "Direct Audio Device: default");
    private final Mixer.Info usb = FakeSound.info("Booth B USB [plughw:1,0]", "Direct Audio Device: USB Audio");
    private final Mixer.Info mic = FakeSound.info("Capture only [hw:2,0]", "Direct Audio Device: line in");

    private Devices three(FakeSound.Open open) {
        FakeSound.Line16 line = new FakeSound.Line16(i -> -1);
        return new Devices(FakeSound.source(List.of(usb, dflt, mic), List.of(
                FakeSound.outputMixer(usb, open, line.line()), FakeSound.outputMixer(dflt, open, line.line()),
                FakeSound.captureMixer(mic))));
    }

    @Test
    void withoutAnyMixerEverythingSaysPlaybackIsUnavailable() {
        Devices none = new Devices(FakeSound.empty());
        assertTrue(none.outputs().isEmpty());
        assertTrue(none.captures().isEmpty());
        NoDeviceException e = assertThrows(NoDeviceException.class, () -> none.chooseOutput(null));
        assertEquals("no audio output device: playback unavailable, render to WAV instead", e.getMessage());
        NoDeviceException open = assertThrows(NoDeviceException.class,
                () -> JavaSoundOutput.open(none, null, 48000, 200, new SplittableRandom(1)));
        assertEquals(Devices.NO_OUTPUT_MESSAGE, open.getMessage());
        assertEquals(Devices.NO_CAPTURE_MESSAGE,
                assertThrows(NoDeviceException.class, () -> none.chooseCapture(null)).getMessage());
    }

    @Test
    void aMixerThatRefusesTheLineCountsAsNoDevice() {
        // Java Sound's two ways of refusing: IllegalArgumentException (no such line) and LineUnavailableException
        for (FakeSound.Open refusal : new FakeSound.Open[] {FakeSound.Open.NO_LINE, FakeSound.Open.UNAVAILABLE}) {
            NoDeviceException e = assertThrows(NoDeviceException.class,
                    () -> JavaSoundOutput.open(three(refusal), null, 48000, 200, new SplittableRandom(1)));
            assertTrue(e.getMessage().startsWith(Devices.NO_OUTPUT_MESSAGE), e.getMessage());
            assertTrue(e.getMessage().contains("default [default]"), e.getMessage());
        }
    }

    @Test
    void listsOutputsAndCapturesSeparatelyInJavaSoundsOrder() {
        Devices d = three(FakeSound.Open.WORKS);
        assertEquals(List.of("Booth B USB [plughw:1,0]", "default [default]"),
                d.outputs().stream().map(AudioDevice::name).toList());
        assertEquals(List.of("Capture only [hw:2,0]"), d.captures().stream().map(AudioDevice::name).toList());
    }

    @Test
    void choosesTheDefaultByItsMarkerAndOthersByExactOrUniquePartialName() throws Exception {
        Devices d = three(FakeSound.Open.WORKS);
        assertEquals("default [default]", d.chooseOutput(null).name());
        assertEquals("default [default]", d.chooseOutput("  ").name());
        assertEquals("Booth B USB [plughw:1,0]", d.chooseOutput("booth b usb [PLUGHW:1,0]").name());
        assertEquals("Booth B USB [plughw:1,0]", d.chooseOutput("usb").name());
        NoDeviceException missing = assertThrows(NoDeviceException.class, () -> d.chooseOutput("Booth C"));
        assertTrue(missing.getMessage().contains("no audio output device matches 'Booth C'"), missing.getMessage());
        assertTrue(missing.getMessage().contains("'default [default]'"), missing.getMessage());
        NoDeviceException ambiguous = assertThrows(NoDeviceException.class, () -> d.chooseOutput("Direct Audio"));
        assertTrue(ambiguous.getMessage().contains("ambiguous"), ambiguous.getMessage());
        // a capture-only mixer is not an output
        assertThrows(NoDeviceException.class, () -> d.chooseOutput("Capture only"));
        assertEquals("Capture only [hw:2,0]", d.chooseCapture(null).name());
    }

    @Test
    void refusesLineBuffersThatDropOutAndUnsupportedRates() {
        Devices d = three(FakeSound.Open.WORKS);
        assertThrows(IllegalArgumentException.class, () -> JavaSoundOutput.open(d, null, 48000, 99, new SplittableRandom(1)));
        assertThrows(IllegalArgumentException.class, () -> JavaSoundOutput.open(d, null, 22050, 200, new SplittableRandom(1)));
    }
}
