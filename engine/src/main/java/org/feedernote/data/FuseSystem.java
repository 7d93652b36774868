package org.feedernote.data;

import org.feedernote.model.Token;

/** The gG fuse systems whose operating currents the tables give. */
public enum FuseSystem implements Token {
    /** BS 88-2 (IEC 60269-2) fuse systems E (bolted) and G (clip-in). */
    BS88_2("bs88-2"),
    /** BS 88-3 (IEC 60269-3) fuse system C. */
    BS88_3("bs88-3");

    private final String token;
    FuseSystem(String token) { this.token = token; }
    @Override public String token() { return token; }
}
