package plumbline.cli;

import picocli.CommandLine;
import plumbline.run.Checked;

/** Reads "5%" or "0.05" as the fraction 0.05. */
final class PercentConverter implements CommandLine.ITypeConverter<Double> {
    @Override
    public Double convert(String value) {
        try {
            return Checked.toleranceRatio(value);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
    }
}
