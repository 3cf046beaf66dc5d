package plumbline.cli;

import picocli.CommandLine;

/** Reads "5%" or "0.05" as the fraction 0.05. */
final class PercentConverter implements CommandLine.ITypeConverter<Double> {
    @Override
    public Double convert(String value) {
        String v = value.trim();
        double d;
        try {
            d = v.endsWith("%") ? Double.parseDouble(v.substring(0, v.length() - 1)) / 100 : Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("'" + value + "' is not a tolerance; expected e.g. 5% or 0.05");
        }
        if (!(d >= 0 && d < 1)) throw new CommandLine.TypeConversionException("'" + value + "' is out of range; expected 0% to 100%");
        return d;
    }
}
