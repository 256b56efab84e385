package org.headway.app;

/** The fields of a segment the editor lets the engineer change. */
public enum SegmentField {
    NAME("name"),
    LENGTH("length"),
    MATERIAL("pipe.material"),
    SIZE("pipe.size"),
    SCHEDULE("pipe.schedule"),
    BORE("innerDiameter"),
    ROUGHNESS("roughness"),
    FITTINGS("fittings"),
    ELEVATION("elevationChange");

    private final String key;

    SegmentField(String key) {
        this.key = key;
    }

    /** The field's key in messages, as in the project file: {@code segments[2].length}. */
    public String key(int index) {
        return "segments[" + index + "]." + key;
    }
}
