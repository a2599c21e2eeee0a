package org.phasewright.demo;

import java.util.Arrays;

/**
 * A demo file's name and its exact bytes.
 *
 * @param name    the file name inside {@code demo-signals/}
 * @param content the bytes to write
 */
public record DemoFile(String name, byte[] content) {

    public DemoFile {
        content = content.clone();
    }

    @Override
    public byte[] content() {
        return content.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DemoFile d && d.name.equals(name) && Arrays.equals(d.content, content);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(content);
    }

    @Override
    public String toString() {
        return "DemoFile[" + name + ", " + content.length + " bytes]";
    }
}
