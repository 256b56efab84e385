package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;

/** The method registry. */
class FrictionMethodsTest {

    @Test
    void everyIdResolvesToItsMethod() {
        assertEquals(
                List.of(
                        "auto",
                        "laminar",
                        "colebrook",
                        "swamee-jain",
                        "haaland",
                        "serghides",
                        "churchill",
                        "goudar-sonnad",
                        "blasius"),
                FrictionMethods.ids());
        for (FrictionCorrelation c : FrictionMethods.all()) {
            assertEquals(c, FrictionMethods.byId(c.id()));
        }
        assertEquals("colebrook", FrictionMethods.byId(" Colebrook ").id());
    }

    @Test
    void unknownIdListsTheKnownOnes() {
        InputException e = assertThrows(InputException.class, () -> FrictionMethods.byId("moody"));
        assertEquals(
                "method: unknown friction method 'moody'; known: auto, laminar, colebrook, swamee-jain, haaland,"
                        + " serghides, churchill, goudar-sonnad, blasius",
                e.getMessage());
    }
}
