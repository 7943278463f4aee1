package org.depotcast.common;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.deser.std.NumberDeserializers;
import com.fasterxml.jackson.databind.deser.std.StdDeserializer;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.module.SimpleModule;
import io.quarkus.jackson.ObjectMapperCustomizer;
import jakarta.inject.Singleton;

import java.io.IOException;
import java.math.BigDecimal;

/**
 * Guards what Jackson accepts from a client. An enum sent as a number (family 12) is refused instead of being read
 * as the thirteenth constant. A number written with more than {@link #MAX_NUMBER_CHARS} characters is refused before
 * it is converted, inside the deserializer of its field, so the 400 names the field and no time goes into expanding
 * it (a number's size is then checked by the field's bounds, by comparison). No bound of ours needs more than 40
 * characters. The parser's own limit is raised from 1,000 to 10,000 characters so that it does not refuse such a
 * number first with no field to name; a longer one is refused by the parser as an unreadable body.
 */
@Singleton
public class JsonInputGuard implements ObjectMapperCustomizer {
    static final int MAX_NUMBER_CHARS = 100;

    @Override
    public void customize(ObjectMapper mapper) {
        mapper.enable(DeserializationFeature.FAIL_ON_NUMBERS_FOR_ENUMS);
        mapper.getFactory().setStreamReadConstraints(StreamReadConstraints.builder().maxNumberLength(10_000).build());
        SimpleModule module = new SimpleModule("number-length-guard");
        add(module, BigDecimal.class, NumberDeserializers.BigDecimalDeserializer.instance);
        add(module, Double.class, NumberDeserializers.find(Double.class, Double.class.getName()));
        add(module, double.class, NumberDeserializers.find(double.class, "double"));
        add(module, Integer.class, NumberDeserializers.find(Integer.class, Integer.class.getName()));
        add(module, int.class, NumberDeserializers.find(int.class, "int"));
        add(module, Long.class, NumberDeserializers.find(Long.class, Long.class.getName()));
        add(module, long.class, NumberDeserializers.find(long.class, "long"));
        mapper.registerModule(module);
    }

    @SuppressWarnings("unchecked")
    private static <T> void add(SimpleModule module, Class<T> type, JsonDeserializer<?> standard) {
        module.addDeserializer(type, new Guarded<>(type, (JsonDeserializer<T>) standard));
    }

    static final class Guarded<T> extends StdDeserializer<T> {
        private final JsonDeserializer<T> standard;

        Guarded(Class<T> type, JsonDeserializer<T> standard) {
            super(type);
            this.standard = standard;
        }

        @Override
        public T deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            JsonToken token = p.currentToken();
            if ((token == JsonToken.VALUE_NUMBER_INT || token == JsonToken.VALUE_NUMBER_FLOAT
                    || token == JsonToken.VALUE_STRING) && p.getTextLength() > MAX_NUMBER_CHARS) {
                throw InvalidFormatException.from(p, "a number of more than " + MAX_NUMBER_CHARS + " characters",
                        "(" + p.getTextLength() + " characters)", handledType());
            }
            return standard.deserialize(p, ctxt);
        }

        @Override
        public T getNullValue(DeserializationContext ctxt) throws com.fasterxml.jackson.databind.JsonMappingException {
            return standard.getNullValue(ctxt);
        }
    }
}
