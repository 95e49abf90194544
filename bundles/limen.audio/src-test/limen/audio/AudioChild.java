package limen.audio;

import java.util.SplittableRandom;

import limen.signal.CheckedStimulus;

/**
 * Run in a child JVM by the device tests, so that Java Sound looks for devices in the environment the test
 * gives it. Modes: {@code lose} plays 2-second trials until the output is lost (exit 3, line {@code LOST msg}),
 * or gives up after 15 (exit 4); {@code none} lists the output devices and tries to open one (exit 5 with
 * {@code NO_DEVICE msg} if there is none). Exit 5 also when {@code lose} finds no device.
 */
public final class AudioChild {

    private AudioChild() {
    }

    public static void main(String[] args) {
        String mode = args.length > 0 ? args[0] : "";
        Devices devices = Devices.system();
        System.out.println("OUTPUTS " + devices.outputs().size());
        try (JavaSoundOutput out = JavaSoundOutput.open(devices, null, 48000, 200, new SplittableRandom(11))) {
            System.out.println("OPEN " + out.describe());
            if (!mode.equals("lose")) {
                System.exit(0);
            }
            CheckedStimulus trial = Trials.tone(500, 40, 2.0, 12); // -60 dBFS peak: quiet
            for (int i = 0; i < 15; i++) {
                System.out.println("PLAYING " + i);
                try {
                    out.play(trial);
                } catch (DeviceLostException e) {
                    System.out.println("LOST " + e.getMessage());
                    System.out.flush();
                    System.exit(3);
                }
                System.out.println("PLAYED " + i);
            }
            System.out.println("NOT_LOST");
            System.exit(4);
        } catch (NoDeviceException e) {
            System.out.println("NO_DEVICE " + e.getMessage());
            System.out.flush();
            System.exit(5);
        }
    }
}
