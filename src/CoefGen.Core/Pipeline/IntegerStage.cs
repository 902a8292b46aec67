using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Pipeline;

/// <summary>Runs the integer design of a pipeline and turns "the weights do not fit the coefficient width" into a located CG2032.</summary>
internal static class IntegerStage
{
    public static T Run<T>(ReadoutDescription d, Func<T> design)
    {
        try
        {
            return design();
        }
        catch (CoefficientWidthException ex)
        {
            var key = d.FixedPoint.CoefBits is null ? "fixed_point.target" : "fixed_point.coef_bits";
            throw new InputException(Diagnostic.Error(FixedPointCodes.NoCoefficientScale, d.LocationOf(key),
                $"{ex.Message}; widen coef_bits or let the signal window settle (a later signal start)", key));
        }
    }
}
