package org.feedernote.model;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** An enumerated value with the spelling the design input uses for it. */
public interface Token {
    String token();

    static <E extends Enum<E> & Token> Optional<E> parse(Class<E> type, String text) {
        // A loop, not a stream: the binding parses several tokens for every circuit of the input.
        for (E e : type.getEnumConstants()) if (e.token().equals(text)) return Optional.of(e);
        return Optional.empty();
    }

    static <E extends Enum<E> & Token> List<String> tokens(Class<E> type) {
        return Arrays.stream(type.getEnumConstants()).map(Token::token).toList();
    }
}
