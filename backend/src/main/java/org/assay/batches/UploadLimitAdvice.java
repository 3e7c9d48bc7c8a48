package org.assay.batches;

import java.net.URI;

import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.multipart.MaxUploadSizeExceededException;

/**
 * Reports an upload over the size limit as a problem naming the fault.
 */
@RestControllerAdvice
@Order(Ordered.HIGHEST_PRECEDENCE)
class UploadLimitAdvice {

	@ExceptionHandler(MaxUploadSizeExceededException.class)
	ProblemDetail tooLarge(MaxUploadSizeExceededException ex) {
		ProblemDetail problem = ProblemDetail.forStatusAndDetail(HttpStatus.CONTENT_TOO_LARGE,
				"The file is larger than the upload limit (spring.servlet.multipart.max-file-size). "
						+ UploadProblems.NOTHING_STORED);
		problem.setType(URI.create("/problems/file-too-large"));
		problem.setTitle("File too large");
		problem.setProperty("fault", "file-too-large");
		problem.setProperty("stored", false);
		return problem;
	}

}
