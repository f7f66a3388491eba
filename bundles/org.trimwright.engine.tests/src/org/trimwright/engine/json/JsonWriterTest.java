package org.trimwright.engine.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;

class JsonWriterTest {

    /** Gson (an independent JSON parser) reads back what we write, escapes included. */
    @Test
    void gsonReadsBackEscapedStringsNumbersAndNesting() {
        String tricky = "quote\" back\\slash\nnew\u0001ctl \u2028 </script>";
        String json = new JsonWriter().beginObject()
                .field("s", tricky)
                .field("d", 1.5e-7)
                .field("n", 42)
                .field("nan", Double.NaN)
                .key("list").beginArray().value(1).value(true).nullValue().endArray()
                .key("empty").beginObject().endObject()
                .endObject().toJson();
        JsonObject o = JsonParser.parseString(json).getAsJsonObject();
        assertEquals(tricky, o.get("s").getAsString());
        assertEquals(1.5e-7, o.get("d").getAsDouble());
        assertEquals(42, o.get("n").getAsInt());
        assertTrue(o.get("nan").isJsonNull());
        assertEquals(3, o.getAsJsonArray("list").size());
        assertEquals(0, o.getAsJsonObject("empty").size());
    }

    @Test
    void misuseIsRefused() {
        assertThrows(IllegalStateException.class, () -> new JsonWriter().beginObject().value(1));
        assertThrows(IllegalStateException.class, () -> new JsonWriter().beginArray().toJson());
        assertThrows(IllegalStateException.class, () -> new JsonWriter().beginArray().endObject());
    }
}
