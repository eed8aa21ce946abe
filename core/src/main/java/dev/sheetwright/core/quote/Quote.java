package dev.sheetwright.core.quote;

import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CutChartRow;
import dev.sheetwright.core.cutting.CutDataOutOfRange;
import dev.sheetwright.core.cutting.CutRates;
import dev.sheetwright.core.cutting.CutTimeEstimate;
import dev.sheetwright.core.cutting.CutWork;
import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.cutting.ProcessSettings;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.UnitFactors;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A material and cutting quote for a finished nest. Make one with {@link #of(QuoteRequest)}.
 *
 * <p>Arithmetic (trade-reference §8.4, computed formulas): stock weight = stock area x weight per area (whole sheets
 * billed); part weight = net part area x weight per area; scrap = stock - parts; utilization = part area / stock area;
 * material cost = count x price per sheet, or weight x price per weight. Cut length, pierces and rapids are read from
 * each sheet's cut plan ({@link CutFigures}: the torch path around every contour plus its leads, one pierce per
 * contour, the rapids of the planned order), the same plan its program is written from. Cut time follows §9.5 with
 * {@link CutTimeEstimate}. Machine cost = cut hours x machine rate.
 *
 * @param areaUnit {@code ft2} for inch jobs, {@code m2} for millimetre jobs (areas for people)
 * @param stock one line per stock size, remnant or coil
 * @param cutTime the cut-time estimate, empty when the cut chart cannot give a speed for the material
 * @param rates every rate used, each with its source
 * @param currency the currency code, when the job or shop gives one
 * @param warnings plain sentences, each once
 */
public record Quote(LengthUnit unit, MassUnit weightUnit, String areaUnit, Material material, CuttingProcess process,
                    List<StockLine> stock, QuoteTotals totals, Optional<CutTimeEstimate> cutTime, List<Rate> rates,
                    Optional<String> currency, List<String> warnings) {

    /** Source of a rate nobody gave. */
    public static final String NOT_PRICED = "not priced";

    public Quote {
        stock = List.copyOf(stock);
        rates = List.copyOf(rates);
        warnings = List.copyOf(new LinkedHashSet<>(warnings));
        Objects.requireNonNull(totals, "totals");
        Objects.requireNonNull(cutTime, "cutTime");
        Objects.requireNonNull(currency, "currency");
    }

    /**
     * One stock line: every piece of the same kind and name.
     *
     * @param area total area in the quote's area unit
     * @param costBasis how the cost was found (by sheet from the job's stock list, by weight from the job or shop)
     */
    public record StockLine(StockKind kind, String name, int count, double area, double weight, double cost,
                            String costBasis) {
    }

    /**
     * Totals. Areas in the quote's area unit, weights in its weight unit, lengths in the job unit.
     *
     * @param cutLength contour length plus leads
     * @param contourLength the torch path around the contours
     * @param leadInLength lead-ins and lead-outs
     * @param cutMinutes total estimated minutes, empty when unknown
     * @param machineCost empty when the cut time is unknown and a machine rate was given
     * @param totalCost material plus machine cost, empty when the machine cost is unknown
     */
    public record QuoteTotals(int sheets, double stockArea, double partArea, double stockWeight, double partWeight,
                              double scrapWeight, double utilization, double cutLength, double contourLength,
                              double leadInLength, int pierces, double rapidLength, OptionalDouble cutMinutes,
                              double materialCost, OptionalDouble machineCost, OptionalDouble totalCost) {
    }

    /** A rate used in the quote: a name, its value with unit as text, the number, and where it came from. */
    public record Rate(String key, String name, double value, String unit, String source) {
    }

    /** Computes the quote. Never guesses a cut speed: outside the chart it records a warning instead. */
    public static Quote of(QuoteRequest request) {
        Objects.requireNonNull(request, "request");
        LengthUnit unit = request.unit();
        Material material = request.material();
        MassUnit mass = MassUnit.of(unit);
        boolean inch = unit == LengthUnit.INCH;
        String areaUnit = inch ? "ft2" : "m2";
        double perArea = inch ? material.weightLbPerFt2() : material.weightKgPerM2();
        List<String> warnings = new ArrayList<>(request.developmentWarnings());
        warnings.addAll(SeamGaugeCheck.warnings(request.fittings(), material));
        List<Rate> rates = new ArrayList<>();
        rates.add(new Rate("weightPerArea", "weight per area", perArea, mass.symbol() + "/" + areaUnit,
                material.source()));

        QuoteTerms terms = request.terms();
        ShopSettings shop = request.shop();
        Optional<WeightPrice> weightPrice = terms.price().isPresent() ? terms.price() : Optional.empty();
        Optional<WeightPrice> shopPrice = shop.price();
        weightPrice.ifPresent(p -> rates.add(new Rate("materialPrice", "material price", p.per(mass),
                "per " + mass.symbol(), p.source())));
        if (weightPrice.isEmpty()) {
            shopPrice.ifPresent(p -> rates.add(new Rate("materialPrice", "material price (stock without a listed"
                    + " cost)", p.per(mass), "per " + mass.symbol(), p.source())));
        }

        // ----- stock lines, weights and material cost (§8.4)
        Map<String, double[]> lineSums = new LinkedHashMap<>(); // count, area, weight, cost
        Map<String, StockUse> lineFirst = new LinkedHashMap<>();
        Map<String, String> lineBasis = new LinkedHashMap<>();
        double stockArea = 0;
        double partArea = 0;
        double contourLength = 0;
        int pierces = 0;
        double rapidLength = 0;
        double leadInLength = 0;
        for (StockUse s : request.stock()) {
            double area = peopleArea(unit, s.area());
            double weight = weightOf(material, unit, s.area());
            double cost;
            String basis;
            if (weightPrice.isPresent()) {
                cost = weight * weightPrice.get().per(mass);
                basis = "by weight (" + weightPrice.get().source() + ")";
            } else if (s.listedCost() > 0) {
                cost = s.listedCost();
                basis = s.kind() == StockKind.COIL ? "by length (job stock list)" : "by piece (job stock list)";
            } else if (shopPrice.isPresent()) {
                cost = weight * shopPrice.get().per(mass);
                basis = "by weight (" + shopPrice.get().source() + ")";
            } else {
                cost = 0;
                basis = NOT_PRICED;
                warnings.add(s.kind().word() + " " + s.name() + " has no price: give stock cost, quote.price-per-"
                        + mass.symbol() + " or a shop price; material cost leaves it out");
            }
            String key = s.kind() + "\u0000" + s.name();
            double[] sum = lineSums.computeIfAbsent(key, k -> new double[4]);
            sum[0] += 1;
            sum[1] += area;
            sum[2] += weight;
            sum[3] += cost;
            lineFirst.putIfAbsent(key, s);
            lineBasis.merge(key, basis, (a, b) -> a.equals(b) ? a : a + "; " + b);
            stockArea += s.area();
            for (Pattern p : s.parts()) {
                partArea += p.area();
            }
            contourLength += s.cut().loopLength();
            leadInLength += s.cut().leadLength();
            pierces += s.cut().pierces();
            rapidLength += s.cut().rapidLength();
        }
        List<StockLine> lines = new ArrayList<>();
        for (Map.Entry<String, double[]> e : lineSums.entrySet()) {
            StockUse first = lineFirst.get(e.getKey());
            double[] v = e.getValue();
            lines.add(new StockLine(first.kind(), first.name(), (int) v[0], v[1], v[2], v[3],
                    lineBasis.get(e.getKey())));
        }
        double stockWeight = weightOf(material, unit, stockArea);
        double partWeight = weightOf(material, unit, partArea);
        double materialCost = lines.stream().mapToDouble(StockLine::cost).sum();

        // ----- cut length and time (§8.4, §9.5)
        double cutLength = contourLength + leadInLength;
        int sheets = request.stock().size();
        CutChart chart = shop.applyTo(request.chart());
        Optional<CutTimeEstimate> time = Optional.empty();
        String speedUnit = unit.symbol() + "/min";
        try {
            CutRates cr = CutRates.from(chart, request.process(), material);
            CutChartRow row = chart.at(request.process(), material.type(), material.thicknessMm());
            interpolationNote(chart, request.process(), material, unit).ifPresent(warnings::add);
            rates.add(new Rate("cutSpeed", "cut speed", unit.fromMm(cr.cutSpeedMmPerMin()), speedUnit,
                    row.source()));
            rates.add(new Rate("pierce", "pierce delay", cr.pierceSeconds(), "s", row.source()));
            rates.add(new Rate("heightSense", "height sensing per start", cr.heightSenseSeconds(), "s",
                    row.source()));
            time = Optional.of(CutTimeEstimate.of(new CutWork(unit.toMm(cutLength), pierces,
                    unit.toMm(rapidLength), sheets), cr));
        } catch (CutDataOutOfRange e) {
            warnings.add("cut time unknown: " + e.getMessage() + "; add a cut-chart row for this metal to the shop"
                    + " file");
        }
        ProcessSettings ps = chart.settings(request.process());
        rates.add(new Rate("rapidSpeed", "rapid traverse", unit.fromMm(ps.rapidMmPerMin()), speedUnit,
                ps.rapidSource()));
        rates.add(new Rate("loadMinutes", "sheet load and unload", ps.loadMinutesPerSheet(), "min per sheet",
                ps.loadSource()));

        // ----- machine cost
        Sourced machineRate = terms.machineRate().isPresent()
                ? new Sourced(terms.machineRate().getAsDouble(), Sourced.JOB)
                : shop.machineRate().isPresent() ? new Sourced(shop.machineRate().getAsDouble(), Sourced.SHOP)
                : new Sourced(0, NOT_PRICED);
        rates.add(new Rate("machineRate", "machine rate", machineRate.value(), "per hour", machineRate.source()));
        OptionalDouble cutMinutes = time.map(t -> OptionalDouble.of(t.totalMinutes())).orElse(OptionalDouble.empty());
        OptionalDouble machineCost;
        if (machineRate.value() == 0) {
            machineCost = OptionalDouble.of(0);
        } else if (cutMinutes.isPresent()) {
            machineCost = OptionalDouble.of(cutMinutes.getAsDouble() / 60 * machineRate.value());
        } else {
            machineCost = OptionalDouble.empty();
            warnings.add("machine cost unknown because the cut time is unknown; total cost left out");
        }
        OptionalDouble totalCost = machineCost.isPresent()
                ? OptionalDouble.of(materialCost + machineCost.getAsDouble()) : OptionalDouble.empty();

        Optional<String> currency = terms.currency().isPresent() ? terms.currency() : shop.currency();
        if (currency.isEmpty() && (materialCost > 0 || machineRate.value() > 0)) {
            warnings.add("prices are given without a currency: add quote.currency (e.g. USD) to the job");
        }
        double stockPeople = peopleArea(unit, stockArea);
        QuoteTotals totals = new QuoteTotals(sheets, stockPeople, peopleArea(unit, partArea), stockWeight, partWeight,
                stockWeight - partWeight, stockArea > 0 ? partArea / stockArea : 0, cutLength, contourLength,
                leadInLength, pierces, rapidLength, cutMinutes, materialCost, machineCost, totalCost);
        return new Quote(unit, mass, areaUnit, material, request.process(), lines, totals, time, rates, currency,
                warnings);
    }

    /** The rate with the given key, if the quote used it. */
    public Optional<Rate> rate(String key) {
        return rates.stream().filter(r -> r.key().equals(key)).findFirst();
    }

    private static double peopleArea(LengthUnit unit, double area) {
        return unit == LengthUnit.INCH ? area / UnitFactors.IN2_PER_FT2 : area / UnitFactors.MM2_PER_M2;
    }

    private static double weightOf(Material material, LengthUnit unit, double area) {
        return unit == LengthUnit.INCH ? material.weightLbOf(area) : material.weightKgOfMm2(area);
    }


    /** A note when the material's thickness falls between two chart rows, naming both rows. */
    private static Optional<String> interpolationNote(CutChart chart, CuttingProcess process, Material material,
                                                      LengthUnit unit) {
        List<CutChartRow> rows = chart.rows(process, material.type());
        double t = material.thicknessMm();
        CutChartRow below = null;
        for (CutChartRow r : rows) {
            if (r.thicknessMm() == t) {
                return Optional.empty();
            }
            if (r.thicknessMm() < t) {
                below = r;
            } else {
                CutChartRow at = chart.at(process, material.type(), t);
                return Optional.of(String.format(Locale.ROOT, "cut speed for %s %.3f mm is interpolated between the"
                                + " %.3f mm and %.3f mm %s chart rows (%.1f %s/min); check it against the machine's"
                                + " chart", material.type().word(), t, below.thicknessMm(), r.thicknessMm(),
                        process.word(), unit.fromMm(at.speedMmPerMin()), unit.symbol()));
            }
        }
        return Optional.empty();
    }
}
