package dev.sheetwright.inventory;

/** Orders for {@link RemnantStore#list}; ties are broken by id. */
public enum RemnantSort {
    AREA_ASC("area_mm2 ASC, seq ASC"),
    AREA_DESC("area_mm2 DESC, seq ASC"),
    ID("seq ASC"),
    DATE("added ASC, seq ASC");

    private final String orderBy;

    RemnantSort(String orderBy) {
        this.orderBy = orderBy;
    }

    String orderBy() {
        return orderBy;
    }
}
