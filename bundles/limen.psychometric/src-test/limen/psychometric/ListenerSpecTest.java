package limen.psychometric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The spec syntax written in issue 5 (model listeners), plus gumbel with the same keys as logistic. */
class ListenerSpecTest {

    @Test
    void parsesEachFamily() {
        PsychometricFunction l = ListenerSpec.parse("logistic:mid=40,scale=2.5", 0.5);
        assertSame(Sigmoids.LOGISTIC, l.sigmoid());
        assertEquals(40.0, l.location());
        assertEquals(2.5, l.spread());
        assertEquals(0.5, l.guess());
        assertEquals(0.0, l.lapse());
        PsychometricFunction n = ListenerSpec.parse("normal:mid=-3.5,sd=0.8,lapse=0.02", 0.0);
        assertSame(Sigmoids.NORMAL, n.sigmoid());
        assertEquals(0.8, n.spread());
        assertEquals(0.02, n.lapse());
        PsychometricFunction w = ListenerSpec.parse(" Weibull : beta = 3 , alpha = 2.5e-1 ", 1.0 / 3);
        assertSame(Sigmoids.WEIBULL, w.sigmoid());
        assertEquals(0.25, w.location());
        assertEquals(3.0, w.spread());
        PsychometricFunction g = ListenerSpec.parse("gumbel:mid=1,scale=0.3,lapse=0.01", 0.25);
        assertSame(Sigmoids.GUMBEL, g.sigmoid());
    }

    @Test
    void formatRoundTrips() {
        for (String s : new String[] { "logistic:mid=40,scale=2.5", "normal:mid=-3.5,sd=0.8,lapse=0.02",
                "weibull:alpha=0.000125,beta=3.5", "gumbel:mid=123456789.5,scale=0.1,lapse=0.06" }) {
            PsychometricFunction f = ListenerSpec.parse(s, 0.5);
            assertEquals(s, ListenerSpec.format(f));
            assertEquals(f, ListenerSpec.parse(ListenerSpec.format(f), 0.5));
        }
        PsychometricFunction odd = new PsychometricFunction(Sigmoids.LOGISTIC, 0.1 + 0.2, 1.0 / 3, 0, 1e-7);
        assertEquals(odd, ListenerSpec.parse(ListenerSpec.format(odd), 0));
    }

    @Test
    void errorsNameTheBadPart() {
        assertMessage("nosuch:mid=1,scale=1", "nosuch");
        assertMessage("logistic mid=1,scale=1", "':'");
        assertMessage("logistic:mid=1,sd=1", "'sd'");
        assertMessage("logistic:mid=1,scale=abc", "abc");
        assertMessage("logistic:mid=1", "missing scale");
        assertMessage("logistic:mid=1,scale=2,mid=3", "twice");
        assertMessage("logistic:mid=1,scale=-2", "-2");
        assertMessage("logistic:mid=1,scale=2,lapse=1.5", "1.5");
        assertMessage("weibull:alpha=0,beta=2", "alpha");
        assertMessage("logistic:mid=1,,scale=2", "not key=value");
        assertMessage("logistic:mid=NaN,scale=2", "finite");
        assertMessage("", "empty");
    }

    private static void assertMessage(String spec, String fragment) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ListenerSpec.parse(spec, 0.5));
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
    }
}
